import type { PageServerLoad } from './$types';
import { requireLedTeams } from '$lib/server/auth/lead-teams';
import { mailConfigFromEnv, usesLocalFake } from '$lib/server/mail/config';
import { OUTBOX_LIST_LIMIT, outboxOf, receivedOf } from '$lib/server/services/outbox';

export const load: PageServerLoad = async (event) => {
	const teams = await requireLedTeams(event, 'the outbox');
	const teamIds = teams.map((team) => team.id);
	const catcher = usesLocalFake(mailConfigFromEnv());
	const outbox = await outboxOf(teamIds);
	// The catcher's copies of the listed messages only: it receives every team's mail.
	const received = catcher ? await receivedOf(outbox.items.map((message) => message.id)) : null;
	return {
		teamNames: teams.map((team) => team.name),
		messages: outbox.items,
		moreMessages: outbox.more,
		received,
		listLimit: OUTBOX_LIST_LIMIT
	};
};
