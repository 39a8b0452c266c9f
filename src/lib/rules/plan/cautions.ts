// Caution-level needs in words: a free group that a step only threatens (an N–H that consumes a
// Grignard reagent, an amine beside a Swern oxidation) is offered a mask, and the plan that leaves
// it free says which cautions it accepts, so no answer reads "nothing needs masking" over a caution.

import { teamRule } from '../check/messages';
import type { CheckRules } from '../check/types';
import type { RouteTree } from './tree';
import type { Need, Plan } from './types';

/** Why a step is a caution for a need, from the rule table, e.g. "MeMgBr: N–H deprotonated, consuming the reagent". */
export function cautionReason(rules: CheckRules, tree: RouteTree, need: Need): string {
	for (const stepId of need.attackedAt) {
		for (const c of tree.conditions.get(stepId)!) {
			for (const group of need.members) {
				const rule = rules.reactivity(group, c.id, c.reagents);
				if (rule?.rating === 'caution') {
					const by = c.reagents.length
						? c.reagents.join(', ')
						: rules.conditionLabel(c.id).toLowerCase();
					const why = rule.layer === 'override' ? teamRule(rule.reason) : rule.reason;
					return `${by} in ${tree.stepName(stepId)}: ${why.replace(/\.$/, '')}`;
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

/** A set of needs the planner solves for: `usual` masks the cautions chemists usually mask, `free` none, `all` every one. */
export type Tier = { kind: 'usual' | 'free' | 'all'; needs: Need[] };

const labels = (rules: CheckRules, needs: Need[]) =>
	[...new Set(needs.map((n) => rules.groupLabel(n.group)))].join(' and ');

/**
 * The tiers' plans as one ranked list: ranks run on, "Ranked below plan k" points at the right
 * plan, and where one tier gives way to the next the plan says why, e.g. "Ranked below plan 3: it
 * leaves the free primary alkylamine unmasked, where chemists usually mask it (…)".
 */
export function joinTiers(
	rules: CheckRules,
	tree: RouteTree,
	tiers: Tier[],
	solved: Plan[][],
	cautions: { usual: Need[]; other: Need[] }
): Plan[] {
	const below = (kind: Tier['kind'], who: string) =>
		kind === 'free'
			? `${who} leaves the free ${labels(rules, cautions.usual)} unmasked, where chemists usually mask it (${cautionReason(rules, tree, cautions.usual[0]!)}).`
			: `${who} adds steps to mask the ${labels(rules, cautions.other)} as well, which the rule table rates only a caution.`;
	const out: Plan[] = [];
	solved.forEach((plans, t) => {
		const offset = out.length;
		const next = solved.slice(t + 1).findIndex((p) => p.length > 0);
		plans.forEach((plan, k) => {
			let rationale = plan.rationale.map((line) =>
				line.replace(
					/^Ranked below plan (\d+):/,
					(_, n: string) => `Ranked below plan ${Number(n) + offset}:`
				)
			);
			if (k === 0 && offset > 0) {
				rationale = rationale.filter((line) => !line.startsWith('Plan 1 comes first:'));
				rationale.push(`Ranked below plan ${offset}: ${below(tiers[t]!.kind, 'it')}`);
			}
			if (offset + k === 0 && plans.length === 1 && next >= 0) {
				rationale.unshift(`Plan 1 comes first: ${below(tiers[t + 1 + next]!.kind, 'plan 2')}`);
			}
			out.push({ ...plan, rank: offset + k + 1, rationale });
		});
	});
	return out;
}
