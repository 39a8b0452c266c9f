import { z } from 'zod';
import { ruleOverrideBody } from '$lib/team-rules/contract';

/**
 * The add form: the API's body, except that an empty reagent box means the whole class (a form
 * always sends the field). The action turns '' into no reagent before the service sees it.
 */
export const addOverrideSchema = ruleOverrideBody.extend({
	reagent: z.union([z.literal(''), ruleOverrideBody.shape.reagent.unwrap()]).default('')
});

export const removeOverrideSchema = z.object({ overrideId: z.uuid() });

/** What the add form says after a submit: the rule is set, or the cell already has one. */
export type OverrideMessage = { text: string; tone: 'success' | 'problem' };
