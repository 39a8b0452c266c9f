import { randomBytes } from 'node:crypto';
import { afterAll, describe, expect, it } from 'vitest';
import { closeDatabase, dbReady, openDatabase } from '../../src/lib/server/db';
import { createSequelize } from '../../src/lib/server/db/connection';
import { listSavedConditions } from '../../src/lib/server/services/library';
import { libraryCsv } from '../../src/lib/server/services/library-csv';
import { importLibraryCsv } from '../../src/lib/server/services/library-import';
import { createRoute, saveRoute } from '../../src/lib/server/services/routes';
import { join, makeProject, makeTeam, makeUser } from '../factories';
import { addEntry } from '../factories/library';

// The condition library on PostgreSQL: the grouped `uses` query (raw SQL with quoted
// identifiers; COUNT answers a bigint string there), the approval filter, the search, and a CSV
// round trip. `npm test` provides the throwaway server (scripts/test-postgres.js).
const url = process.env.TEST_POSTGRES_URL;
const database = `orthogon_library_${randomBytes(4).toString('hex')}`;

const doc = (name: string, savedCondition?: string) => ({
	name,
	intermediates: [
		{ id: 'a', structure: 'OCCO' },
		{ id: 'b', structure: 'CC(C)(C)[Si](C)(C)OCCO' }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'TBSCl, imidazole', savedCondition }]
});

describe.skipIf(!url)('the condition library on PostgreSQL', () => {
	const admin = url ? createSequelize(url) : null;

	afterAll(async () => {
		await closeDatabase();
		await admin?.query(`DROP DATABASE IF EXISTS ${database}`);
		await admin?.close();
	});

	it('counts uses, filters, searches and round-trips CSV as on SQLite', async () => {
		await admin!.query(`CREATE DATABASE ${database}`);
		await closeDatabase();
		openDatabase(url!.replace(/\/[^/]+$/, `/${database}`));
		await dbReady();
		const team = await makeTeam();
		const chemist = await makeUser();
		await join(chemist, team.id, 'lead');
		const project = await makeProject(team.id);
		const entry = await addEntry(chemist, team.id, { notes: 'Buffered with AcOH' });
		await addEntry(chemist, team.id, { kind: 'remove', reagents: 'TBAF, THF' });
		const first = await createRoute(chemist, project, doc('First', entry.id));
		await createRoute(chemist, project, doc('Second', entry.id));
		const uses = async () =>
			(await listSavedConditions([team.id], {})).find((c) => c.id === entry.id)!.uses;
		expect(await uses()).toBe(2);
		await saveRoute(chemist, first, first.version, doc('First'), team.id);
		expect(await uses()).toBe(1);
		expect((await listSavedConditions([team.id], { approved: 'false' })).length).toBe(2);
		expect((await listSavedConditions([team.id], { q: 'acoh' })).map((c) => c.id)).toEqual([
			entry.id
		]);
		const other = await makeTeam();
		await join(chemist, other.id, 'lead');
		const exported = await libraryCsv(team.id);
		expect(
			await importLibraryCsv(chemist, 'lead', other.id, { name: 'x.csv', text: exported })
		).toEqual({ created: 2, updated: 0, unchanged: 0 });
		expect((await listSavedConditions([other.id], {})).map((c) => c.reagents).sort()).toEqual([
			'TBAF, THF',
			'TBSCl, imidazole, DMF'
		]);
	}, 60_000);
});
