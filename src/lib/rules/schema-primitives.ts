/**
 * The building blocks every rule-file schema uses: enums whose errors name the bad value and the
 * valid ones, the non-empty text field, and the id and rating enums. Apart from schemas.ts so that
 * the row schemas (schemas.ts, protecting-group-schema.ts) share one definition of each.
 */
import { z } from 'zod';
import {
	CONDITION_IDS,
	FREE_GROUP_IDS,
	PROTECTING_GROUP_IDS,
	REACTIVITY_ROW_RATINGS,
	REAGENT_TAGS,
	STABILITY_RATINGS
} from './ids';

/** An enum whose error names the bad value and lists the valid ones. */
export function idEnum<const T extends readonly [string, ...string[]]>(what: string, values: T) {
	return z.enum(values, {
		error: (issue) =>
			issue.input === undefined
				? `missing ${what}`
				: `unknown ${what} ${JSON.stringify(issue.input)} (valid: ${values.join(', ')})`
	});
}

/** Non-empty, trimmed text. */
export const text = z.string().trim().min(1, 'must not be empty');

export const conditionIdSchema = idEnum('condition id', CONDITION_IDS);
export const protectingGroupIdSchema = idEnum('protecting group id', PROTECTING_GROUP_IDS);
export const freeGroupIdSchema = idEnum('free group id', FREE_GROUP_IDS);
export const stabilityRatingSchema = z.enum(STABILITY_RATINGS, {
	error: (issue) =>
		issue.input === undefined
			? 'missing rating (every condition class needs one: stable, caution or labile)'
			: `unknown rating ${JSON.stringify(issue.input)} (valid: ${STABILITY_RATINGS.join(', ')})`
});
export const reactivityRatingSchema = idEnum('reactivity rating', REACTIVITY_ROW_RATINGS);
export const reagentTagSchema = idEnum('reagent tag', REAGENT_TAGS);
