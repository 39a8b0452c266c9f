// The team's stored rule overrides reach the check and the planner (issue 16): a route's check,
// plan and review copy apply its team's layer and no other team's; POST /api/check and /api/plan
// apply it when asked by `teamId`. Overrides are seeded as rows, as the rules API would store them.

import type { RequestEvent } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import type { RouteDocument } from '../../src/lib/route/document';
import { TeamRuleOverride, type Team } from '../../src/lib/server/db';
import { createRoute } from '../../src/lib/server/services/routes';
import { teamRuleLayer } from '../../src/lib/server/services/team-rules-layer';
import { TEAM_RULE_PREFIX } from '../../src/lib/team-rules/contract';
import { POST as checkPost } from '../../src/routes/api/check/+server';
import { POST as planPost } from '../../src/routes/api/plan/+server';
import { GET as routeCheck } from '../../src/routes/api/routes/[routeId=uuid]/check/+server';
import { POST as routePlan } from '../../src/routes/api/routes/[routeId=uuid]/plan/+server';
import { load as reportLoad } from '../../src/routes/routes/[routeId=uuid]/report/+page.server';
import {
	callApi,
	fakeEvent,
	freshDatabase,
	join,
	makeProject,
	makeTeam,
	makeTeamWithEveryRole,
	makeUser
} from '../factories';
import { line } from '../factories/plan-routes';
import { CLAYDEN, WUTS } from '../factories/textbook-sources';

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let kestrel: Team;
let kestrelChemist: Awaited<ReturnType<typeof makeUser>>;
const routes = { bench: '', other: '' };

const TBS_REASON = 'Our primary TBS ethers do not survive aqueous hydroxide at 50 °C';
const LIOH_REASON = 'LiOH in THF/H2O strips our TBS ethers; NaOH does not';
const DIOXOLANE_REASON = 'Our dioxolanes open under MeMgBr in refluxing THF';

// A methyl ester saponified beside a primary TBS ether: TBS stands up to aqueous hydroxide by
// default (WUTS), so only a team's override can make this step clash.
const saponify = (reagents: string) => ({
	id: 'saponify',
	substrate: 'COC(=O)CCCO[Si](C)(C)C(C)(C)C',
	product: 'OC(=O)CCCO[Si](C)(C)C(C)(C)C',
	reagents
});
const saponifyRoute: RouteDocument = {
	name: 'TBS acid',
	intermediates: [
		{ id: 'ester', structure: saponify('').substrate },
		{ id: 'acid', structure: saponify('').product }
	],
	steps: [{ id: 'saponify', from: ['ester'], to: 'acid', reagents: 'NaOH, THF, H2O' }]
};
// A ketone standing by while MeMgBr adds to the ester: the planner masks it, a dioxolane first
// (CLAYDEN: ketals survive Grignard reagents).
const grignard = line(['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'], ['MeMgBr, THF'], 'Grignard');

function override(teamId: string, row: Partial<TeamRuleOverride>) {
	return TeamRuleOverride.create({
		teamId,
		subject: 'TBS',
		condition: 'base-aqueous',
		reagent: null,
		rating: 'labile',
		reason: TBS_REASON,
		source: 'Bench notebook 3, p. 12',
		authorId: null,
		...row
	});
}

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	await override(f.team.id, {});
	await override(f.team.id, {
		subject: 'dioxolane',
		condition: 'organometallic-grignard',
		reason: DIOXOLANE_REASON
	});
	for (const [key, team, person] of [
		['bench', f.team, f.people.chemist],
		['other', f.other, f.people.outsider]
	] as const) {
		const project = await makeProject(team.id);
		routes[key] = (await createRoute(person, project, saponifyRoute)).id;
	}
	kestrel = await makeTeam('Kestrel');
	kestrelChemist = await makeUser('Kestrel chemist');
	await join(kestrelChemist, kestrel.id, 'chemist');
	await override(kestrel.id, { reagent: 'LiOH', reason: LIOH_REASON });
});

type Who = keyof typeof f.people;
async function get(handler: unknown, who: Who, routeId: string) {
	return callApi(handler, { user: f.people[who], method: 'GET', params: { routeId } });
}
async function post(handler: unknown, who: Who, body: unknown, params = {}) {
	return callApi(handler, { user: f.people[who], method: 'POST', body, params });
}
type Clash = { severity: string; subject: string; message: string };
const clashesOf = (body: { steps: { clashes: Clash[] }[] }) => body.steps[0]!.clashes;

describe("a route's check under its team's overrides", () => {
	it(`shows the team's clash on its own route and on no other team's — ${WUTS}`, async () => {
		const bench = await get(routeCheck, 'viewer', routes.bench);
		expect(bench.status).toBe(200);
		const [clash, ...rest] = clashesOf(bench.body);
		expect(rest).toEqual([]);
		expect(clash).toMatchObject({ severity: 'clash', subject: 'TBS' });
		expect(clash!.message.startsWith(`${TEAM_RULE_PREFIX} ${TBS_REASON}.`)).toBe(true);
		expect(clash!.message).toContain('Source: Bench notebook 3, p. 12.');

		const other = await get(routeCheck, 'outsider', routes.other);
		expect(other.status).toBe(200);
		expect(clashesOf(other.body)).toEqual([]);
	});

	it('prints the team rule in the review copy', async () => {
		const event = fakeEvent({
			user: f.people.reviewer,
			path: `/routes/${routes.bench}/report`
		}) as RequestEvent & { params: Record<string, string> };
		event.params = { routeId: routes.bench };
		const copy = (await (reportLoad as unknown as (e: RequestEvent) => Promise<unknown>)(
			event
		)) as { steps: { check: { clashes: Clash[] } | null }[] };
		expect(copy.steps[0]!.check?.clashes.map((c) => c.message.slice(0, 11))).toEqual([
			'team rule: '
		]);
	});
});

describe('POST /api/check with teamId', () => {
	const body = (reagents: string, teamId?: string) => ({
		steps: [saponify(reagents)],
		...(teamId ? { teamId } : {})
	});

	it("applies the named team's overrides, and only then", async () => {
		const plain = await post(checkPost, 'viewer', body('NaOH, THF, H2O'));
		expect(plain.status).toBe(200);
		expect(clashesOf(plain.body)).toEqual([]);
		const team = await post(checkPost, 'viewer', body('NaOH, THF, H2O', f.team.id));
		expect(team.status).toBe(200);
		expect(clashesOf(team.body).map((c) => c.message)).toEqual([
			expect.stringMatching(/^team rule: Our primary TBS ethers/)
		]);
	});

	it('answers 404 for a team the caller is not in, or that does not exist', async () => {
		const foreign = await post(checkPost, 'outsider', body('NaOH, THF, H2O', f.team.id));
		expect(foreign.status).toBe(404);
		expect(foreign.body.error.code).toBe('not_found');
		const none = await post(
			checkPost,
			'viewer',
			body('NaOH, THF, H2O', '00000000-0000-4000-8000-000000000000')
		);
		expect(none.status).toBe(404);
		expect((await post(checkPost, 'viewer', body('NaOH', 'bench'))).status).toBe(400);
	});

	it('applies a reagent-specific row with that reagent and not with another of its class', async () => {
		const as = (reagents: string) =>
			callApi(checkPost, {
				user: kestrelChemist,
				method: 'POST',
				body: body(reagents, kestrel.id)
			});
		const lithium = await as('LiOH, THF, H2O');
		expect(clashesOf(lithium.body).map((c) => c.message)).toEqual([
			expect.stringMatching(/^team rule: LiOH in THF\/H2O strips our TBS ethers; NaOH does not\. /)
		]);
		expect(clashesOf((await as('NaOH, THF, H2O')).body)).toEqual([]);
	});

	it('refuses, by name, a stored row the rule table does not know', async () => {
		const stale = await makeTeam('Stale rules');
		const member = await makeUser('Stale member');
		await join(member, stale.id, 'viewer');
		await override(stale.id, { subject: 'TBDMS' });
		const answer = await callApi(checkPost, {
			user: member,
			method: 'POST',
			body: body('NaOH', stale.id)
		});
		expect(answer.status).toBe(422);
		expect(answer.body.error.code).toBe('invalid_team_rules');
		expect(answer.body.error.message).toMatch(/nothing was checked/);
		expect(answer.body.error.message).toMatch(/"TBDMS"/);
	});
});

describe('the planner under the team overrides', () => {
	type PlanBody = {
		plans: { protections: { protectingGroup: string }[]; rationale: string[] }[];
	};
	const firstPg = (answer: PlanBody) => answer.plans[0]!.protections[0]!.protectingGroup;

	it(`picks another PG when the team's rule makes the default unfit — ${CLAYDEN}`, async () => {
		const plain = await post(planPost, 'viewer', grignard);
		expect(plain.status).toBe(200);
		expect(firstPg(plain.body)).toBe('dioxolane');

		const team = await post(planPost, 'viewer', { ...grignard, teamId: f.team.id });
		expect(team.status).toBe(200);
		const body = team.body as PlanBody;
		expect(firstPg(body)).not.toBe('dioxolane');
		expect(body.plans.flatMap((p) => p.protections.map((x) => x.protectingGroup))).not.toContain(
			'dioxolane'
		);
		expect(body.plans[0]!.rationale).toContainEqual(
			expect.stringMatching(
				/^dioxolane rejected: .* would remove it \(team rule: Our dioxolanes open under MeMgBr in refluxing THF\)/
			)
		);
		expect((await post(planPost, 'outsider', { ...grignard, teamId: f.team.id })).status).toBe(404);
	});

	it("plans a stored route under its team's layer", async () => {
		const project = await makeProject(f.team.id);
		const stored = await createRoute(f.people.chemist, project, grignard);
		const answer = await post(routePlan, 'viewer', undefined, { routeId: stored.id });
		expect(answer.status).toBe(200);
		expect(firstPg(answer.body)).not.toBe('dioxolane');
	});
});

describe('teamRuleLayer', () => {
	it('reads the rows by subject kind under the team name; none → no layer', async () => {
		expect(await teamRuleLayer(f.other.id)).toBeUndefined();
		const layer = await teamRuleLayer(kestrel.id);
		expect(layer).toEqual({
			name: 'Kestrel',
			stability: [
				{
					protectingGroup: 'TBS',
					condition: 'base-aqueous',
					reagent: 'LiOH',
					rating: 'labile',
					reason: LIOH_REASON,
					source: 'Bench notebook 3, p. 12'
				}
			],
			reactivity: []
		});
		await override(kestrel.id, {
			subject: 'ketone',
			condition: 'hydride-mild',
			rating: 'none',
			reason: 'Hindered'
		});
		expect((await teamRuleLayer(kestrel.id))?.reactivity).toEqual([
			expect.objectContaining({ group: 'ketone', condition: 'hydride-mild', rating: 'none' })
		]);
	});
});
