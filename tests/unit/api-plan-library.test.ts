import type { InferCreationAttributes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { POST as planPosted } from '../../src/routes/api/plan/+server';
import { POST as planStored } from '../../src/routes/api/routes/[routeId=uuid]/plan/+server';
import { POST as savePlan } from '../../src/routes/api/routes/[routeId=uuid]/plan/[rank=rank]/save/+server';
import { Route, SavedCondition, Step, type Team } from '../../src/lib/server/db';
import type { SessionUser } from '../../src/lib/types';
import type { CheckedPlan } from '../../src/lib/rules/plan';
import { approvedSavedConditions } from '../../src/lib/server/services/planning-library';
import { createRoute, routeDocument } from '../../src/lib/server/services/routes';
import { callApi, freshDatabase, join, makeProject, makeTeam, makeUser } from '../factories';
import { line } from '../factories/plan-routes';

// POST /api/routes/{id}/plan reads the route's team's library (issue 16): approved, not retired
// entries only, of that team only, the most used first. The route: a primary alcohol stands by
// a Grignard addition to a methyl ester, so plan 1 masks it as a TBS ether (Greene's Protective
// Groups, 5th ed.: TBS ethers stand Grignard reagents; from memory), put on with TBSCl and
// imidazole by the textbook, or with TBSOTf and 2,6-lutidine by the team's entry (Corey, Cho,
// Rücker & Hua, Tetrahedron Lett. 1981, 22, 3455).
const alcoholByGrignard = () =>
	line(['OCCCC(=O)OC', 'OCCCC(C)(C)O'], ['MeMgBr, THF'], 'OG-2031 hydroxy ester');
const TEXTBOOK = 'TBSCl, imidazole, DMF';
const TBSOTF = 'TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C';

type Bench = { team: Team; chemist: SessionUser; viewer: SessionUser; routeId: string };

/** A team of its own (a chemist and a viewer) with one stored route, so entries never leak between tests. */
async function bench(): Promise<Bench> {
	const team = await makeTeam();
	const chemist = await makeUser();
	const viewer = await makeUser();
	await join(chemist, team.id, 'chemist');
	await join(viewer, team.id, 'viewer');
	const project = await makeProject(team.id);
	const route = await createRoute(chemist, project, alcoholByGrignard());
	return { team, chemist, viewer, routeId: route.id };
}

const approved = new Date('2026-11-30T09:00:00Z');
async function saved(
	teamId: string,
	fields: Partial<InferCreationAttributes<SavedCondition>> = {}
) {
	return SavedCondition.create({
		teamId,
		protectingGroup: 'TBS',
		kind: 'install',
		reagents: TBSOTF,
		solvent: 'CH2Cl2',
		temperature: '−78 °C',
		time: '30 min',
		scale: '2 g',
		yield: 94,
		reference: 'NB-OG-112 p. 14',
		notes: null,
		authorId: null,
		approvedById: null,
		approvedAt: approved,
		retiredAt: null,
		...fields
	});
}

async function firstPlan(b: Bench): Promise<CheckedPlan> {
	const answer = await callApi(planStored, {
		user: b.viewer,
		method: 'POST',
		params: { routeId: b.routeId }
	});
	expect(answer.status).toBe(200);
	const plan = answer.body.plans[0] as CheckedPlan;
	expect(plan.protections[0]!.protectingGroup).toBe('TBS');
	return plan;
}
const protectStep = (plan: CheckedPlan) => plan.route.steps.find((s) => s.intent === 'protect')!;
const followsNothing = (plan: CheckedPlan) => {
	expect(protectStep(plan).reagents).toBe(TEXTBOOK);
	expect(plan.route.steps.some((s) => s.savedCondition)).toBe(false);
	expect(plan.rationale.join(' ')).not.toContain("the team's saved condition");
};

beforeAll(freshDatabase);

describe('POST /api/routes/{id}/plan with the team’s condition library', () => {
	it('writes the team’s approved entry into the added step and names it in the rationale', async () => {
		const b = await bench();
		const entry = await saved(b.team.id);
		const plan = await firstPlan(b);
		expect(protectStep(plan)).toMatchObject({ reagents: TBSOTF, savedCondition: entry.id });
		expect(plan.rationale.join('\n')).toContain(
			`TBS on: the team's saved condition (${TBSOTF}), 94 % on 2 g, ref. NB-OG-112 p. 14, not yet followed by a step of the team's routes, instead of the textbook recipe (${TEXTBOOK}).`
		);
	});

	it('writes the entry as "Use this" would: reagents, then the solvent and temperature', async () => {
		const b = await bench();
		const entry = await saved(b.team.id, { reagents: 'TBSOTf, 2,6-lutidine' });
		const plan = await firstPlan(b);
		expect(protectStep(plan)).toMatchObject({ reagents: TBSOTF, savedCondition: entry.id });
	});

	it('saves plan 1 with the entry’s reagents, as the plans showed it', async () => {
		const b = await bench();
		await saved(b.team.id);
		const route = await Route.findByPk(b.routeId);
		const answer = await callApi(savePlan, {
			user: b.chemist,
			method: 'POST',
			params: { routeId: b.routeId, rank: '1' },
			body: { version: route!.version }
		});
		expect(answer.status).toBe(201);
		const stored = await routeDocument((await Route.findByPk(answer.body.id))!);
		expect(stored.steps.find((s) => s.intent === 'protect')!.reagents).toBe(TBSOTF);
	});

	it('does not use an entry a lead has not approved', async () => {
		const b = await bench();
		await saved(b.team.id, { approvedAt: null });
		followsNothing(await firstPlan(b));
	});

	it('does not use a retired entry, even an approved one', async () => {
		const b = await bench();
		await saved(b.team.id, { retiredAt: new Date('2026-12-01T09:00:00Z') });
		followsNothing(await firstPlan(b));
	});

	it('does not use another team’s approved entry', async () => {
		const b = await bench();
		const other = await bench();
		await saved(other.team.id);
		followsNothing(await firstPlan(b));
	});

	it('follows the entry the team’s routes use most, counted from their steps only', async () => {
		const b = await bench();
		const other = await bench();
		const higherYield = await saved(b.team.id, { reagents: 'TBSCl, imidazole, CH2Cl2', yield: 99 });
		const used = await saved(b.team.id, { yield: 80 });
		// Two steps of the team's routes follow `used`; three steps of another team's route name
		// `higherYield`, which must not count for this team.
		await Step.update({ savedConditionId: used.id }, { where: { routeId: b.routeId } });
		await Step.update(
			{ savedConditionId: used.id },
			{ where: { routeId: (await sameTeamRoute(b)).id } }
		);
		await Step.update({ savedConditionId: higherYield.id }, { where: { routeId: other.routeId } });
		const entries = await approvedSavedConditions(b.team.id);
		expect(new Map(entries.map((e) => [e.id, e.uses]))).toEqual(
			new Map([
				[higherYield.id, 0],
				[used.id, 2]
			])
		);
		const plan = await firstPlan(b);
		expect(protectStep(plan).savedCondition).toBe(used.id);
		expect(plan.rationale.join(' ')).toContain(
			"followed by 2 steps of the team's routes, instead of the textbook recipe"
		);
	});
});

describe('POST /api/plan with a teamId', () => {
	const post = (user: SessionUser, teamId?: string) =>
		callApi(planPosted, {
			user,
			method: 'POST',
			body: { ...alcoholByGrignard(), ...(teamId ? { teamId } : {}) }
		});

	it('follows the named team’s approved entry, and only then', async () => {
		const b = await bench();
		const entry = await saved(b.team.id);
		const withTeam = await post(b.viewer, b.team.id);
		expect(withTeam.status).toBe(200);
		const plan = withTeam.body.plans[0] as CheckedPlan;
		expect(protectStep(plan)).toMatchObject({ reagents: TBSOTF, savedCondition: entry.id });
		// Without a team the posted route is planned from the textbook alone.
		const alone = await post(b.viewer);
		followsNothing(alone.body.plans[0] as CheckedPlan);
	});

	it('answers 404 for a team the caller is not in, before reading its library', async () => {
		const b = await bench();
		const other = await bench();
		await saved(other.team.id);
		const refused = await post(b.chemist, other.team.id);
		expect(refused.status).toBe(404);
	});
});

/** A second route in the bench's team (its own project). */
async function sameTeamRoute(b: Bench) {
	const project = await makeProject(b.team.id);
	return createRoute(b.chemist, project, alcoholByGrignard());
}
