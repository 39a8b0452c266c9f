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
