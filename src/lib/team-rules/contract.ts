// The team's rule overrides (issue 16): one rating of the rule table, as the team sees it. Pure
// data and zod; the service checks that the subject, condition and reagent exist in the table and
// that the rating fits the subject (422 naming the field).

import { z } from 'zod';
import { conditionIdSchema } from '../rules/schema-primitives';
import { STABILITY_RATINGS } from '../rules/ids';
import { text } from '../schemas/text';

/** A protecting group's ratings (its stability under the condition). */
export const PG_RATINGS = STABILITY_RATINGS;
/** A free group's ratings (how it reacts under the condition); `none` silences the entry. */
export const GROUP_RATINGS = ['reacts', 'caution', 'none'] as const;
export const OVERRIDE_RATINGS = [...new Set([...PG_RATINGS, ...GROUP_RATINGS])] as [
	string,
	...string[]
];

export const OVERRIDE_LIMITS = { subject: 64, reagent: 200, reason: 2000, source: 500 } as const;

/** `POST /api/teams/{teamId}/rules`. */
export const ruleOverrideBody = z.object({
	/** A protecting group id or a free group id of the rule table. */
	subject: text()
		.trim()
		.min(1, 'Name a protecting group or a free group.')
		.max(OVERRIDE_LIMITS.subject),
	condition: conditionIdSchema,
	/** A reagent's name in rules/reagents.json, for that reagent only; omit for the whole class. */
	reagent: text().trim().min(1).max(OVERRIDE_LIMITS.reagent).optional(),
	rating: z.enum(OVERRIDE_RATINGS, { error: `Rating is one of ${OVERRIDE_RATINGS.join(', ')}.` }),
	reason: text().trim().min(1, 'Say why the team rates it so.').max(OVERRIDE_LIMITS.reason),
	source: text()
		.trim()
		.min(1, 'Name a source: a paper, a notebook page, or "team experience".')
		.max(OVERRIDE_LIMITS.source)
});
export type RuleOverrideBody = z.output<typeof ruleOverrideBody>;

/** The words a check or plan message starts with when the team's override decided it. */
export const TEAM_RULE_PREFIX = 'team rule:';
