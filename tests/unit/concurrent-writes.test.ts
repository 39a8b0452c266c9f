import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join as joinPath } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeDatabase, dbReady, openDatabase, Route } from '../../src/lib/server/db';
import { createRoute, saveRoute, VersionConflict } from '../../src/lib/server/services/routes';
import { makeProject, makeTeamWithEveryRole } from '../factories';
import { line } from '../factories/plan-routes';

// A file database (not :memory:), because Sequelize's sqlite dialect opens one connection per
// transaction on a file, which is where parallel writes used to meet SQLITE_BUSY.
const dir = mkdtempSync(joinPath(tmpdir(), 'orthogon-writes-'));
let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Awaited<ReturnType<typeof makeProject>>;

beforeAll(async () => {
	await closeDatabase();
	openDatabase(`sqlite:${joinPath(dir, 'writes.db')}`);
	await dbReady();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Parallel project');
});

afterAll(async () => {
	await closeDatabase();
	rmSync(dir, { recursive: true, force: true });
});

const doc = (name: string) =>
	line(['CC(=O)CCC(=O)OC', 'CC1(CCC(=O)OC)OCCO1'], ['ethylene glycol, TsOH'], name);

describe('parallel writes on a SQLite file', () => {
	it('creates 10 routes in parallel, every one succeeding', async () => {
		const created = await Promise.allSettled(
			Array.from({ length: 10 }, (_, i) =>
				createRoute(f.people.chemist, project, doc(`Created ${i}`))
			)
		);
		expect(created.filter((r) => r.status === 'rejected')).toEqual([]);
	});

	it('saves 20 different routes in parallel, every one succeeding', async () => {
		const routes = [];
		for (let i = 0; i < 20; i++) {
			routes.push(await createRoute(f.people.chemist, project, doc(`Route ${i}`)));
		}
		const saved = await Promise.allSettled(
			routes.map((route, i) =>
				saveRoute(f.people.chemist, route, 1, doc(`Route ${i}, revised`), f.team.id)
			)
		);
		expect(saved.filter((r) => r.status === 'rejected')).toEqual([]);
		expect(saved.map((r) => (r.status === 'fulfilled' ? r.value : null))).toEqual(
			routes.map(() => 2)
		);
	});

	it('lets exactly one of ten same-version saves win; every loser gets VersionConflict', async () => {
		const route = await createRoute(f.people.chemist, project, doc('Contested'));
		const results = await Promise.allSettled(
			Array.from({ length: 10 }, (_, i) =>
				saveRoute(f.people.chemist, route, 1, doc(`Edit ${i}`), f.team.id)
			)
		);
		const won = results.filter((r) => r.status === 'fulfilled');
		const lost = results.flatMap((r) => (r.status === 'rejected' ? [r.reason] : []));
		expect(won).toHaveLength(1);
		expect(lost).toHaveLength(9);
		for (const reason of lost) {
			expect(reason).toBeInstanceOf(VersionConflict);
		}
		expect((await Route.findByPk(route.id))?.version).toBe(2);
	});
});
