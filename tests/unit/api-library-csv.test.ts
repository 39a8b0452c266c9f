import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import {
	LIBRARY_CSV_COLUMNS,
	MAX_IMPORT_CSV_BYTES,
	MAX_IMPORT_ROWS,
	WRITABLE_CSV_COLUMNS
} from '../../src/lib/library/contract';
import { ActivityEvent, SavedCondition } from '../../src/lib/server/db';
import { freshDatabase, makeTeam, makeTeamWithEveryRole, join } from '../factories';
import { addEntry, downloadLibraryCsv, uploadLibraryCsv } from '../factories/library';

// The library's CSV (issue 16): the export's header and rows, the round trip (an export imports
// back unchanged, into another team as new entries and into its own team as no change), a file
// with bad rows (every problem reported by row, column and reason; nothing stored), the size and
// row limits, and who may import.

let f: Awaited<ReturnType<typeof makeTeamWithEveryRole>>;

const HEADER = WRITABLE_CSV_COLUMNS.join(',');
/** The written columns of every row, sorted: rows imported in one statement share a createdAt. */
const writable = (text: string) =>
	Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true })
		.data.map((row) => JSON.stringify(WRITABLE_CSV_COLUMNS.map((column) => row[column])))
		.sort();

beforeAll(async () => {
	await freshDatabase();
	f = await makeTeamWithEveryRole();
	await addEntry(f.people.chemist, f.team.id, {
		reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2',
		temperature: '-78 °C',
		yield: 94,
		reference: '10.1021/ja00772a043',
		notes: 'Quote "this", a comma, and\na second line'
	});
	await addEntry(f.people.lead, f.team.id, {
		protectingGroup: 'PMB',
		kind: 'remove',
		reagents: '=HYPERLINK("http://x.example")',
		solvent: 'CH2Cl2/H2O 18:1',
		yield: 0
	});
});

describe('library export', () => {
	it('answers text/csv as an attachment: the header row, then one row per entry', async () => {
		const { status, headers, text } = await downloadLibraryCsv(f.people.viewer, f.team.id);
		expect(status).toBe(200);
		expect(headers.get('content-type')).toBe('text/csv; charset=utf-8');
		expect(headers.get('content-disposition')).toMatch(/^attachment; filename=".+\.csv"$/);
		const parsed = Papa.parse<string[]>(text, { skipEmptyLines: true }).data;
		expect(parsed[0]).toEqual([...LIBRARY_CSV_COLUMNS]);
		expect(parsed).toHaveLength(3);
		const row = Object.fromEntries(LIBRARY_CSV_COLUMNS.map((c, i) => [c, parsed[1]![i]]));
		expect(row).toMatchObject({ author: 'Chemist', approved: 'false', uses: '0', yield: '94' });
	});

	it('writes a cell a spreadsheet would run as a formula with a leading apostrophe', async () => {
		const { text } = await downloadLibraryCsv(f.people.viewer, f.team.id);
		expect(text).toContain(`"'=HYPERLINK(""http://x.example"")"`);
		expect(text).toContain("'-78 °C");
	});

	it('is 404 for another team, 422 without a teamId', async () => {
		expect((await downloadLibraryCsv(f.people.outsider, f.team.id)).status).toBe(404);
		const missing = await downloadLibraryCsv(f.people.viewer, '');
		expect(missing.status).toBe(422);
	});
});

describe('library import', () => {
	it('round trip: an export imported into another team gives an export with the same written columns', async () => {
		const exported = (await downloadLibraryCsv(f.people.chemist, f.team.id)).text;
		const team = await makeTeam('Round trip team');
		await join(f.people.chemist, team.id, 'chemist');
		const imported = await uploadLibraryCsv(f.people.chemist, team.id, exported);
		expect(imported).toEqual({ status: 201, body: { created: 2, updated: 0, unchanged: 0 } });
		const again = (await downloadLibraryCsv(f.people.chemist, team.id)).text;
		expect(writable(again)).toEqual(writable(exported));
		const stored = await SavedCondition.findAll({ where: { teamId: team.id } });
		expect(stored.map((s) => s.temperature)).toEqual(expect.arrayContaining([null, '-78 °C']));
		expect(stored.every((s) => s.approvedAt === null && s.authorId === f.people.chemist.id)).toBe(
			true
		);
	});

	it('round trip into its own team changes nothing; an edited cell changes that entry only', async () => {
		const before = await SavedCondition.count();
		const exported = (await downloadLibraryCsv(f.people.lead, f.team.id)).text;
		expect(await uploadLibraryCsv(f.people.lead, f.team.id, exported)).toEqual({
			status: 201,
			body: { created: 0, updated: 0, unchanged: 2 }
		});
		const edited = exported.replace(',94,', ',91,');
		expect((await uploadLibraryCsv(f.people.lead, f.team.id, edited)).body).toEqual({
			created: 0,
			updated: 1,
			unchanged: 1
		});
		expect(await SavedCondition.count()).toBe(before);
		expect(await SavedCondition.count({ where: { teamId: f.team.id, yield: 91 } })).toBe(1);
	});

	it('reports every bad row with row, column and reason, and stores nothing of the file', async () => {
		const before = await SavedCondition.count();
		const imports = await ActivityEvent.count({ where: { kind: 'library.imported' } });
		const csv = [
			HEADER,
			'TBS,install,"TBSCl, imidazole",DMF,rt,2 h,1 g,95,,fine row',
			'XYZ,install,TBSCl,,,,,,,',
			'',
			'TBS,sideways,TBSCl,,,,,101,,',
			'TBS,remove,,,,,,abc,,',
			'TBS,remove,TBAF'
		].join('\r\n');
		const { status, body } = await uploadLibraryCsv(f.people.chemist, f.team.id, csv);
		expect(status).toBe(422);
		expect(body.error.code).toBe('invalid_rows');
		expect(body.error.message).toContain('nothing was imported');
		const problems = body.error.details.rows as { row: number; column: string | null }[];
		expect(problems.map((p) => [p.row, p.column])).toEqual([
			[3, 'protectingGroup'],
			[5, 'kind'],
			[5, 'yield'],
			[6, 'reagents'],
			[6, 'yield'],
			[7, null]
		]);
		for (const problem of body.error.details.rows) {
			expect(problem.reason.length).toBeGreaterThan(5);
		}
		expect(await SavedCondition.count()).toBe(before);
		expect(await ActivityEvent.count({ where: { kind: 'library.imported' } })).toBe(imports);
	});

	it('refuses a NUL in a cell (naming row and column) and keeps one out of the file name', async () => {
		const refused = await uploadLibraryCsv(
			f.people.chemist,
			f.team.id,
			`${HEADER}\nTBS,install,TBSCl\u0000,,,,,,,`
		);
		expect(refused.status).toBe(422);
		expect(refused.body.error.details.rows).toEqual([
			{ row: 2, column: 'reagents', reason: expect.stringContaining('control characters') }
		]);
		const named = await uploadLibraryCsv(
			f.people.chemist,
			f.team.id,
			`${HEADER}\nTBS,install,TBSCl,,,,,,,`,
			'nul\u0000.csv'
		);
		expect(named.status).toBe(201);
		const event = await ActivityEvent.findOne({
			where: { kind: 'library.imported' },
			order: [['createdAt', 'DESC']]
		});
		expect(event!.summary).toContain('“nul.csv”');
	});

	it('refuses a header with an unknown or missing column (row 1)', async () => {
		const { status, body } = await uploadLibraryCsv(
			f.people.chemist,
			f.team.id,
			'protectingGroup,reagents,colour\nTBS,TBSCl,blue'
		);
		expect(status).toBe(422);
		expect(body.error.details.rows).toEqual([
			{ row: 1, column: 'colour', reason: expect.stringContaining('Unknown column') },
			{ row: 1, column: 'kind', reason: expect.stringContaining('Missing column') }
		]);
	});

	it('refuses a chemist’s change to another author’s entry, naming the row', async () => {
		const exported = (await downloadLibraryCsv(f.people.chemist, f.team.id)).text;
		const edited = exported.replace('CH2Cl2/H2O 18:1', 'CH2Cl2/H2O 10:1');
		const { status, body } = await uploadLibraryCsv(f.people.chemist, f.team.id, edited);
		expect(status).toBe(422);
		expect(body.error.details.rows).toEqual([
			{ row: 3, column: 'id', reason: expect.stringContaining('author or a lead') }
		]);
	});

	it('answers 413 for a file over the size limit or with too many rows; 422 for only a header', async () => {
		const big = HEADER + '\n' + 'x'.repeat(MAX_IMPORT_CSV_BYTES + 1);
		expect((await uploadLibraryCsv(f.people.chemist, f.team.id, big)).status).toBe(413);
		const many = [HEADER, ...Array(MAX_IMPORT_ROWS + 1).fill('TBS,install,TBSCl,,,,,,,')].join(
			'\n'
		);
		const tooMany = await uploadLibraryCsv(f.people.chemist, f.team.id, many);
		expect(tooMany.status).toBe(413);
		expect(tooMany.body.error.code).toBe('too_many_rows');
		expect((await uploadLibraryCsv(f.people.chemist, f.team.id, HEADER + '\n')).status).toBe(422);
	});

	it('lets a lead and a chemist import; reviewer and viewer 403; another team 404; no file 400', async () => {
		const one = `${HEADER}\nTBDPS,install,"TBDPSCl, imidazole",,,,,,,`;
		for (const who of ['lead', 'chemist'] as const) {
			expect((await uploadLibraryCsv(f.people[who], f.team.id, one)).status).toBe(201);
		}
		for (const who of ['reviewer', 'viewer'] as const) {
			expect((await uploadLibraryCsv(f.people[who], f.team.id, one)).status).toBe(403);
		}
		expect((await uploadLibraryCsv(f.people.outsider, f.team.id, one)).status).toBe(404);
		expect((await uploadLibraryCsv(null, f.team.id, one)).status).toBe(401);
		expect((await uploadLibraryCsv(f.people.chemist, f.team.id, null)).status).toBe(400);
	});
});
