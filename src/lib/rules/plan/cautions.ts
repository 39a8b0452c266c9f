// Caution-level needs in words: a free group that a step only threatens (an N–H that consumes a
// Grignard reagent, an amine beside a Swern oxidation) is offered a mask, and the plan that leaves
// it free says which cautions it accepts, so no answer reads "nothing needs masking" over a caution.

import type { CheckRules } from '../check/types';
import type { RouteTree } from './tree';
import type { Need } from './types';

/** Why a step is a caution for a need, from the rule table, e.g. "MeMgBr: N–H deprotonated, consuming the reagent". */
export function cautionReason(rules: CheckRules, tree: RouteTree, need: Need): string {
	for (const stepId of need.attackedAt) {
		for (const c of tree.conditions.get(stepId)!) {
			for (const group of need.members) {
				const rule = rules.reactivity(group, c.id, c.explicit ? [] : c.reagents);
				if (rule?.rating === 'caution') {
					const by = c.reagents.length
						? c.reagents.join(', ')
						: rules.conditionLabel(c.id).toLowerCase();
					return `${by} in ${tree.stepName(stepId)}: ${rule.reason.replace(/\.$/, '')}`;
				}
			}
		}
	}
	return 'a caution in the rule table';
}

/** Said beside a PG chosen for a caution-level need. */
export const maskedBecause = (rules: CheckRules, tree: RouteTree, need: Need) =>
	`The rule table rates this only a caution (${cautionReason(rules, tree, need)}); masking it avoids the side reaction.`;

/** The sentence of a plan that leaves a caution-level need free. */
export const leftFree = (rules: CheckRules, tree: RouteTree, need: Need) =>
	`Leaves the free ${rules.groupLabel(need.group)} as it is, accepting a caution (${cautionReason(rules, tree, need)}).`;

/** Said where no PG in the table can mask a caution-level need. */
export const cannotMask = (rules: CheckRules, tree: RouteTree, need: Need, why: string) =>
	`The free ${rules.groupLabel(need.group)} stays free with a caution (${cautionReason(rules, tree, need)}): ${why}.`;
