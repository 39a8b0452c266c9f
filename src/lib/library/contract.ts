// The condition library's contract (issue 16): kinds, request bodies, the listing query and the
// CSV columns. Pure data and zod, so pages, endpoints and tests read the same definitions.

import { z } from 'zod';
import { protectingGroupIdSchema } from '../rules/schema-primitives';
import { FIELD_LIMITS } from '../schemas/limits';
import { text } from '../schemas/text';

/** A saved condition puts its protecting group on (`install`) or takes it off (`remove`). */
export const SAVED_CONDITION_KINDS = ['install', 'remove'] as const;
export type SavedConditionKind = (typeof SAVED_CONDITION_KINDS)[number];

export const SAVED_CONDITION_KIND_LABELS: Record<SavedConditionKind, string> = {
	install: 'Puts it on',
	remove: 'Takes it off'
};

const limited = (field: keyof typeof FIELD_LIMITS & `library${string}`) =>
	text().trim().max(FIELD_LIMITS[field].max, `At most ${FIELD_LIMITS[field].max} characters.`);

/** An optional text field: blank is stored as null. */
const optionalText = (field: Parameters<typeof limited>[0]) =>
	limited(field)
		.nullable()
		.optional()
		.transform((value) => (value ? value : null));

/** The fields a person writes; `conditions` (classes), author, approval and uses are derived. */
export const savedConditionFields = z.object({
	protectingGroup: protectingGroupIdSchema,
	kind: z.enum(SAVED_CONDITION_KINDS, { error: 'Kind is install or remove.' }),
	reagents: limited('libraryReagents').min(1, 'Name the reagents.'),
	solvent: optionalText('librarySolvent'),
	temperature: optionalText('libraryShortText'),
	time: optionalText('libraryShortText'),
	scale: optionalText('libraryShortText'),
	yield: z
		.number({ error: 'Yield is a number of percent.' })
		.min(0, 'Yield is between 0 and 100 %.')
		.max(100, 'Yield is between 0 and 100 %.')
		.nullable()
		.optional()
		.transform((value) => value ?? null),
	reference: optionalText('libraryReference'),
	notes: optionalText('libraryNotes')
});
export type SavedConditionFields = z.output<typeof savedConditionFields>;

/** `POST /api/library`. */
export const newSavedConditionBody = savedConditionFields.extend({ teamId: z.uuid() });
export type NewSavedConditionBody = z.output<typeof newSavedConditionBody>;
/** What a browser sends to `POST /api/library`: the PG id is any text, the server's parse decides. */
export type NewSavedConditionRequest = Omit<
	z.input<typeof newSavedConditionBody>,
	'protectingGroup'
> & {
	protectingGroup: string;
};

/** `PATCH /api/library/{id}`: any of the fields, and `retired` (kept, no longer suggested). */
export const savedConditionPatch = savedConditionFields
	.partial()
	.extend({ retired: z.boolean().optional() });
export type SavedConditionPatch = z.output<typeof savedConditionPatch>;

/** `GET /api/library?teamId&protectingGroup&kind&q&approved`; every parameter optional. */
export const libraryQuery = z.object({
	teamId: z.uuid().optional(),
	protectingGroup: protectingGroupIdSchema.optional(),
	kind: z.enum(SAVED_CONDITION_KINDS).optional(),
	q: text().trim().max(200).optional(),
	approved: z.enum(['true', 'false']).optional()
});
export type LibraryQuery = z.output<typeof libraryQuery>;

/**
 * The CSV columns, in order: export writes them all with a header row; import reads the written
 * ones (`WRITABLE_CSV_COLUMNS`) and ignores the derived ones, so an export can be imported again.
 */
export const WRITABLE_CSV_COLUMNS = [
	'protectingGroup',
	'kind',
	'reagents',
	'solvent',
	'temperature',
	'time',
	'scale',
	'yield',
	'reference',
	'notes'
] as const satisfies readonly (keyof SavedConditionFields)[];
export const LIBRARY_CSV_COLUMNS = [
	'id',
	...WRITABLE_CSV_COLUMNS,
	'author',
	'approved',
	'retired',
	'uses',
	'createdAt',
	'updatedAt'
] as const;

/** The most rows one CSV import takes (all or none). */
export const MAX_IMPORT_ROWS = 2000;

/** The largest CSV file one import reads (413 beyond): 2000 full rows fit with room to spare. */
export const MAX_IMPORT_CSV_BYTES = 2 * 1024 * 1024;

/**
 * One problem of a refused import (422 `invalid_rows`, `details: { rows }`): the row as a
 * spreadsheet numbers it (the header is row 1), the column (null for the row as a whole), why.
 */
export type ImportRowProblem = { row: number; column: string | null; reason: string };
