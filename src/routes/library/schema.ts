import { z } from 'zod';
import { savedConditionFields } from '$lib/library/contract';

const contractYield = savedConditionFields.shape.yield;

/** The create-and-edit form: the contract's fields, the team, and the entry's id when editing. */
export const libraryEntrySchema = savedConditionFields
	.extend({
		id: z.uuid().optional(),
		teamId: z.uuid(),
		// A plain number here so superforms reads the field as one ('' → null); the contract's
		// range and wording are applied below rather than copied.
		yield: z.number().nullable().optional()
	})
	.superRefine((entry, ctx) => {
		const checked = contractYield.safeParse(entry.yield);
		for (const issue of checked.error?.issues ?? []) {
			ctx.addIssue({ code: 'custom', message: issue.message, path: ['yield'] });
		}
	});
export type LibraryEntryForm = z.output<typeof libraryEntrySchema>;

/** The buttons of a row (approve, retire, restore, delete) name the entry they act on. */
export const entryIdSchema = z.object({ id: z.uuid() });

/**
 * A new entry's optional fields, all null: a bound input needs a value, not undefined, and
 * superforms leaves optional fields undefined. Derived from the schema, so a new optional field
 * joins by itself.
 */
export const blankEntry = Object.fromEntries(
	Object.entries(savedConditionFields.shape)
		.filter(([, field]) => field.safeParse(undefined).success)
		.map(([name]) => [name, null])
) as Partial<LibraryEntryForm>;
