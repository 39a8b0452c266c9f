import Papa from 'papaparse';
import {
	LIBRARY_CSV_COLUMNS,
	MAX_IMPORT_ROWS,
	savedConditionFields,
	WRITABLE_CSV_COLUMNS,
	type ImportRowProblem,
	type SavedConditionFields
} from '../../library/contract';
import { ApiFailure } from '../api';
import { listSavedConditions } from './library';

// The library as CSV, written and read with Papa Parse. A cell a spreadsheet would run as a
// formula (=, +, -, @, tab, CR first) is written with a leading apostrophe (OWASP's CSV
// injection advice); reading takes that apostrophe off again, so an export imports back unchanged.

const FORMULA_START = /^[=+\-@\t\r]/;

/** The team's library as CSV: a header row of LIBRARY_CSV_COLUMNS, one row per entry. */
export async function libraryCsv(teamId: string): Promise<string> {
	const entries = await listSavedConditions([teamId], {});
	const data = entries.map((entry) =>
		LIBRARY_CSV_COLUMNS.map((column) => {
			if (column === 'author') {
				return entry.author?.name ?? '';
			}
			const value = entry[column];
			return value === null ? '' : String(value);
		})
	);
	return Papa.unparse(
		{ fields: [...LIBRARY_CSV_COLUMNS], data },
		{ escapeFormulae: FORMULA_START, newline: '\r\n' }
	);
}

/** One data row read from a file: its spreadsheet row number, the `id` cell and the fields. */
export type CsvRow = { row: number; id: string | null; fields: SavedConditionFields };

const REQUIRED_COLUMNS = ['protectingGroup', 'kind', 'reagents'] as const;
const KNOWN_COLUMNS: readonly string[] = LIBRARY_CSV_COLUMNS;

function unescapeFormula(cell: string): string {
	return cell.startsWith("'") && FORMULA_START.test(cell.slice(1)) ? cell.slice(1) : cell;
}

/** The header's problems (row 1): unknown, repeated or missing columns. */
function headerProblems(header: string[]): ImportRowProblem[] {
	const problems: ImportRowProblem[] = header.flatMap((column, i) =>
		!KNOWN_COLUMNS.includes(column)
			? [{ row: 1, column, reason: `Unknown column; the columns are ${KNOWN_COLUMNS.join(', ')}.` }]
			: header.indexOf(column) !== i
				? [{ row: 1, column, reason: 'This column appears twice.' }]
				: []
	);
	for (const column of REQUIRED_COLUMNS) {
		if (!header.includes(column)) {
			problems.push({ row: 1, column, reason: 'Missing column: every row needs it.' });
		}
	}
	return problems;
}

/** A yield cell as a number (`94`, `94 %`), null when blank; anything else is left for zod to refuse. */
function yieldOf(cell: string): unknown {
	const bare = cell.replace(/%\s*$/, '').trim();
	if (bare === '') {
		return null;
	}
	const value = Number(bare);
	return Number.isNaN(value) ? cell : value;
}

/** The written fields of one row, checked by the same schema as the API; problems per cell. */
function readRow(header: string[], cells: string[], row: number) {
	const raw: Record<string, unknown> = {};
	for (const column of WRITABLE_CSV_COLUMNS) {
		const at = header.indexOf(column);
		const cell = at === -1 ? '' : unescapeFormula(cells[at] ?? '');
		raw[column] = column === 'yield' ? yieldOf(cell) : cell;
	}
	const parsed = savedConditionFields.safeParse(raw);
	const idAt = header.indexOf('id');
	const id = idAt === -1 ? '' : (cells[idAt] ?? '').trim();
	if (!parsed.success) {
		const problems = parsed.error.issues.map((issue) => ({
			row,
			column: String(issue.path[0] ?? ''),
			reason: issue.message
		}));
		return { problems };
	}
	return { row: { row, id: id || null, fields: parsed.data } satisfies CsvRow, problems: [] };
}

/**
 * Reads a library CSV: every row is checked and every problem reported (row, column, reason),
 * so a refusal (422 `invalid_rows`) lists them all at once; more rows than MAX_IMPORT_ROWS → 413.
 */
export function readLibraryCsv(text: string): CsvRow[] {
	const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), {
		skipEmptyLines: false,
		delimitersToGuess: [',', ';', '\t']
	});
	const [headerCells = [], ...lines] = parsed.data;
	const header = headerCells.map((cell) => cell.trim());
	const problems: ImportRowProblem[] = headerProblems(header);
	const headerRead = problems.length === 0;
	// A file too small to guess the delimiter from falls back to commas; its header says the rest.
	for (const error of parsed.errors.filter((e) => e.code !== 'UndetectableDelimiter')) {
		// Papa numbers the file's records from 0 and the header is record 0: a spreadsheet's row 1.
		problems.push({ row: (error.row ?? 0) + 1, column: null, reason: error.message });
	}
	const filled = lines
		.map((cells, i) => ({ cells, row: i + 2 }))
		.filter(({ cells }) => cells.some((cell) => cell.trim() !== ''));
	if (filled.length > MAX_IMPORT_ROWS) {
		throw new ApiFailure(
			413,
			'too_many_rows',
			`The file has ${filled.length} rows; one import takes at most ${MAX_IMPORT_ROWS}. Split it and import the parts.`
		);
	}
	if (filled.length === 0 && problems.length === 0) {
		throw new ApiFailure(422, 'empty_file', 'The file has a header but no rows to import.');
	}
	const rows: CsvRow[] = [];
	if (headerRead) {
		for (const { cells, row } of filled) {
			if (cells.length !== header.length) {
				problems.push({
					row,
					column: null,
					reason: `The row has ${cells.length} cells; the header has ${header.length}.`
				});
				continue;
			}
			const read = readRow(header, cells, row);
			problems.push(...read.problems);
			if (read.row) {
				rows.push(read.row);
			}
		}
	}
	if (problems.length > 0) {
		throw invalidRows(problems);
	}
	return rows;
}

/** 422 listing every problem; nothing of the file is stored. */
export function invalidRows(problems: ImportRowProblem[]): ApiFailure {
	const rowCount = new Set(problems.map((problem) => problem.row)).size;
	return new ApiFailure(
		422,
		'invalid_rows',
		`${rowCount} row${rowCount === 1 ? '' : 's'} of the file cannot be imported (see details.rows); nothing was imported.`,
		{ rows: problems }
	);
}
