import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupFileName, backupSqlite, integrityCheck } from '../../scripts/sqlite-backup.js';
import { closeDatabase, dbReady, openDatabase, Route } from '../../src/lib/server/db';
import { createRoute } from '../../src/lib/server/services/routes';
import { makeProject, makeTeamWithEveryRole } from '../factories';
import { line } from '../factories/plan-routes';

const dir = mkdtempSync(join(tmpdir(), 'orthogon-backup-'));
const live = join(dir, 'orthogon.db');
let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;
let project: Awaited<ReturnType<typeof makeProject>>;

beforeAll(async () => {
	await closeDatabase();
	openDatabase(`sqlite:${live}`);
	await dbReady();
	f = await makeTeamWithEveryRole();
	project = await makeProject(f.team.id, 'Backed-up project');
});
afterAll(async () => {
	await closeDatabase();
	rmSync(dir, { recursive: true, force: true });
});

function routeNames(file: string): Promise<string[]> {
	return new Promise((resolve, reject) => {
		const db = new sqlite3.Database(file, sqlite3.OPEN_READONLY, (err) => {
			if (err) {
				return reject(err);
			}
			db.all('SELECT name FROM routes', (error, rows: { name: string }[]) => {
				db.close();
				if (error) {
					reject(error);
				} else {
					resolve(rows.map((r) => r.name));
				}
			});
		});
	});
}

describe('online SQLite backup', () => {
	it('names backups by UTC time, sortable and without colons', () => {
		expect(backupFileName(new Date('2026-12-03T14:05:09.123Z'))).toBe(
			'orthogon-2026-12-03T14-05-09Z.db'
		);
	});

	it('takes a backup while writes go on; the copy opens, passes integrity_check and holds the rows', async () => {
		const doc = (i: number) =>
			line(['CC(=O)CCC(=O)OC', 'CC1(CCC(=O)OC)OCCO1'], ['ethylene glycol, TsOH'], `Before ${i}`);
		for (let i = 0; i < 5; i++) {
			await createRoute(f.people.chemist, project, doc(i));
		}
		let writing = true;
		let during = 0;
		const writer = (async () => {
			while (writing) {
				await createRoute(f.people.chemist, project, {
					...doc(during),
					name: `During ${during++}`
				});
			}
		})();
		await new Promise((resolve) => setTimeout(resolve, 50));
		const copy = await backupSqlite(live, join(dir, 'backups'));
		writing = false;
		await writer;
		expect(during).toBeGreaterThan(0);
		expect(await integrityCheck(copy)).toBe('ok');
		const names = await routeNames(copy);
		expect(names).toEqual(
			expect.arrayContaining(['Before 0', 'Before 1', 'Before 2', 'Before 3', 'Before 4'])
		);
		// A snapshot: never more than the live database holds afterwards.
		expect(names.length).toBeLessThanOrEqual(await Route.count());
	});
});
