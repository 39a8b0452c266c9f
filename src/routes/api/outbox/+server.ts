import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import type { OutboxAnswer } from '$lib/api/answers';
import { apiHandler } from '$lib/server/api';
import { requireLedTeams } from '$lib/server/auth/lead-teams';
import { OUTBOX_LIST_LIMIT, outboxOf } from '$lib/server/services/outbox';

/**
 * `GET /api/outbox` (leads) → `{ messages }`: the mails of the teams the caller leads, newest
 * first. Over OUTBOX_LIST_LIMIT the answer holds the newest ones and a header says so.
 */
export const GET: RequestHandler = apiHandler(async (event) => {
	const teams = await requireLedTeams(event, 'the outbox');
	const { items, more } = await outboxOf(teams.map((team) => team.id));
	const answer: OutboxAnswer = { messages: items };
	return json(answer, {
		headers: more ? { 'x-orthogon-truncated': `newest ${OUTBOX_LIST_LIMIT} shown` } : {}
	});
});
