import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import {
	closeDatabase,
	dbReady,
	openDatabase,
	SavedCondition,
	Step
} from '../../src/lib/server/db';
import { createSequelize } from '../../src/lib/server/db/connection';
import { approvedSavedConditions } from '../../src/lib/server/services/planning-library';
import { createRoute } from '../../src/lib/server/services/routes';
import { join, makeProject, makeTeam, makeUser } from '../factories';
import { line } from '../factories/plan-routes';

// What the planner reads of a team's library, on PostgreSQL: the uses query joins the team's
// routes in raw SQL and PostgreSQL answers COUNT as a bigint string. `npm test` provides the
// throwaway server (scripts/test-postgres.js); this suite uses a database of its own on it.
const url = process.env.TEST_POSTGRES_URL;
const database = `orthogon_library_${randomBytes(4).toString('hex')}`;

describe.skipIf(!url)('the planner’s library query on PostgreSQL', () => {
	const admin = url ? createSequelize(url) : null;

	afterAll(async () => {
		await closeDatabase();
		await admin?.query(`DROP DATABASE IF EXISTS ${database}`);
		await admin?.close();
	});

	it('lists approved, not retired entries with uses counted from the team’s steps only', async () => {
		await admin!.query(`CREATE DATABASE ${database}`);
		await closeDatabase();
		openDatabase(url!.replace(/\/[^/]+$/, `/${database}`));
		await dbReady();
		const [team, other] = [await makeTeam(), await makeTeam()];
		const chemist = await makeUser();
		await join(chemist, team.id, 'chemist');
		await join(chemist, other.id, 'chemist');
		const [ours, theirs] = [await makeProject(team.id), await makeProject(other.id)];
		const doc = line(['OCCCC(=O)OC', 'OCCCC(C)(C)O'], ['MeMgBr, THF']);
		const routes = [
			await createRoute(chemist, ours, doc),
			await createRoute(chemist, ours, doc),
			await createRoute(chemist, theirs, doc)
		];
		const entry = {
			teamId: team.id,
			protectingGroup: 'TBS',
			kind: 'install' as const,
			reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2',
			solvent: null,
			temperature: null,
			time: null,
			scale: null,
			yield: 94,
			reference: null,
			notes: null,
			authorId: null,
			approvedById: null,
			approvedAt: new Date(),
			retiredAt: null
		};
		const used = await SavedCondition.create(entry);
		const elsewhere = await SavedCondition.create(entry);
		await SavedCondition.create({ ...entry, approvedAt: null });
		await SavedCondition.create({ ...entry, retiredAt: new Date() });
		await Step.update(
			{ savedConditionId: used.id },
			{ where: { routeId: [routes[0]!.id, routes[1]!.id] } }
		);
		await Step.update({ savedConditionId: elsewhere.id }, { where: { routeId: routes[2]!.id } });
		const entries = await approvedSavedConditions(team.id);
		expect(new Map(entries.map((e) => [e.id, e.uses]))).toEqual(
			new Map([
				[used.id, 2],
				[elsewhere.id, 0]
			])
		);
		expect(entries[0]!.yield).toBe(94);
	}, 60_000);
});
