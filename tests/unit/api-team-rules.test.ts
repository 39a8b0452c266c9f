import { beforeAll, describe, expect, it } from 'vitest';
import * as teamRules from '../../src/routes/api/teams/[teamId=uuid]/rules/+server';
import * as oneRule from '../../src/routes/api/teams/[teamId=uuid]/rules/[overrideId=uuid]/+server';
import { ActivityEvent, TeamRuleOverride } from '../../src/lib/server/db';
import { recentActivity } from '../../src/lib/server/services/activity';
import { callApi, fakeEvent, freshDatabase, makeTeamWithEveryRole } from '../factories';

// The team's rule overrides against the issue 16 contract: GET for every role of the team, POST
// and DELETE for leads only (others 403, another team 404), 422 naming the field for what the
// rule table does not have, 409 for the same cell twice, and an activity line for each change.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
type Who = keyof typeof f.people;

const valid = {
	subject: 'TBS',
	condition: 'lewis-acid',
	rating: 'labile',
	reason: 'Lost on the OG-series diols with BF3·OEt2 at 0 °C.',
	source: 'Notebook OG-12, p. 40'
};
const list = (who: Who, teamId = f.team.id) =>
	callApi(teamRules.GET, { user: f.people[who], method: 'GET', params: { teamId } });
const add = (who: Who, body: unknown, teamId = f.team.id) =>
	callApi(teamRules.POST, { user: f.people[who], method: 'POST', body, params: { teamId } });
async function remove(who: Who, overrideId: string, teamId = f.team.id) {
	const event = fakeEvent({ user: f.people[who], method: 'DELETE' });
	Object.assign(event, { params: { teamId, overrideId } });
	const response = await oneRule.DELETE(event as Parameters<typeof oneRule.DELETE>[0]);
	return { status: response.status, body: response.status === 204 ? null : await response.json() };
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
});

describe('team rules API: who may read and change', () => {
	it('lists for every role of the team, 404 for another team', async () => {
		for (const who of ['lead', 'chemist', 'reviewer', 'viewer'] as const) {
			expect(await list(who)).toEqual({ status: 200, body: { overrides: [] } });
		}
		const outsider = await list('outsider');
		expect(outsider.status).toBe(404);
		expect(outsider.body.error.code).toBe('not_found');
	});

	it('lets only a lead add: others 403, another team’s lead 404, nothing stored for them', async () => {
		for (const who of ['chemist', 'reviewer', 'viewer'] as const) {
			const refused = await add(who, valid);
			expect(refused.status).toBe(403);
			expect(refused.body.error.code).toBe('forbidden');
		}
		expect((await add('outsider', valid)).status).toBe(404);
		expect(await TeamRuleOverride.count()).toBe(0);
		const created = await add('lead', valid);
		expect(created).toEqual({ status: 201, body: { id: expect.any(String) } });
	});

	it('answers the listing in the contract’s shape, author and date included', async () => {
		const { body } = await list('viewer');
		expect(body.overrides).toEqual([
			{
				id: expect.any(String),
				...valid,
				author: { id: f.people.lead.id, name: 'Lead' },
				createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/)
			}
		]);
		expect(body.overrides[0]).not.toHaveProperty('reagent');
	});

	it('refuses the same cell twice with 409 and keeps the first', async () => {
		const again = await add('lead', { ...valid, rating: 'caution' });
		expect(again.status).toBe(409);
		expect(again.body.error.code).toBe('override_exists');
		expect(again.body.error.message).toContain('remove that override first');
		// The same PG and class for one reagent is another cell.
		const forOneReagent = await add('lead', {
			...valid,
			reagent: 'BF3·OEt2',
			rating: 'caution'
		});
		expect(forOneReagent.status).toBe(201);
		expect(await TeamRuleOverride.count({ where: { teamId: f.team.id } })).toBe(2);
	});

	it('lets only a lead remove (204); others 403; another team 404, also for its own ids', async () => {
		const id = (await add('lead', { ...valid, condition: 'heat', rating: 'caution' })).body.id;
		for (const who of ['chemist', 'reviewer', 'viewer'] as const) {
			expect((await remove(who, id)).status).toBe(403);
		}
		expect((await remove('outsider', id)).status).toBe(404);
		// The outsider leads the other team, but this override is not that team's.
		const elsewhere = await remove('outsider', id, f.other.id);
		expect(elsewhere.status).toBe(404);
		expect(elsewhere.body.error.code).toBe('not_found');
		expect(await TeamRuleOverride.findByPk(id)).not.toBeNull();
		expect(await remove('lead', id)).toEqual({ status: 204, body: null });
		expect(await TeamRuleOverride.findByPk(id)).toBeNull();
		expect((await remove('lead', id)).status).toBe(404);
	});
});

describe('team rules API: what the rule table does not have is 422 naming the field', () => {
	const cases: [string, Record<string, unknown>, string, string][] = [
		['an unknown subject', { subject: 'TBX' }, 'subject', 'neither a protecting group'],
		['an unknown condition', { condition: 'acid-medium' }, 'condition', 'acid-medium'],
		['a rating no subject has', { rating: 'gone' }, 'rating', 'Rating is one of'],
		['a free group’s rating for a PG', { rating: 'reacts' }, 'rating', 'does not fit TBS'],
		[
			'a PG’s rating for a free group',
			{ subject: 'alcohol-primary', rating: 'labile' },
			'rating',
			'does not fit alcohol-primary'
		],
		['an unknown reagent', { reagent: 'unobtainium' }, 'reagent', 'not a reagent'],
		[
			'a reagent of another class',
			{ condition: 'acid-strong', reagent: 'TBAF' },
			'reagent',
			'TBAF brings fluoride'
		],
		['a NUL in the reason', { reason: 'BF3\u0000' }, 'reason', 'control characters']
	];
	it.each(cases)('%s', async (_, change, field, says) => {
		const before = await TeamRuleOverride.count();
		const refused = await add('lead', { ...valid, condition: 'oxidant-strong', ...change });
		expect(refused.status).toBe(422);
		expect(refused.body.error.details).toEqual({ field });
		expect(refused.body.error.message).toContain(field);
		expect(refused.body.error.message).toContain(says);
		expect(await TeamRuleOverride.count()).toBe(before);
	});

	it('keeps 400 for a body that is not an object', async () => {
		const refused = await add('lead', [valid]);
		expect(refused.status).toBe(400);
		expect(refused.body.error.code).toBe('invalid_body');
	});
});

describe('team rules API: the activity feed', () => {
	it('has a line for every add and every removal, in the team’s feed only', async () => {
		const id = (
			await add('lead', { ...valid, condition: 'fluoride', reagent: 'nBu4NF', rating: 'caution' })
		).body.id;
		await remove('lead', id);
		const lines = (await recentActivity({ teamId: f.team.id }, 50)).map((l) => l.summary);
		expect(lines).toContain('Lead set a team rule: TBS under Fluoride (TBAF only) is caution.');
		expect(lines).toContain(
			'Lead removed the team rule TBS under Fluoride (TBAF only) (was caution); the table’s rating applies again.'
		);
		const kinds = await ActivityEvent.findAll({ where: { teamId: f.team.id } });
		expect(kinds.filter((e) => e.kind === 'rules.override-added').length).toBe(4);
		expect(kinds.filter((e) => e.kind === 'rules.override-removed').length).toBe(2);
		expect(await ActivityEvent.count({ where: { teamId: f.other.id } })).toBe(0);
	});
});
