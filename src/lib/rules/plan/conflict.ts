// Whether two chosen options can share a route: the pairwise test the joint search (search.ts)
// asks tens of thousands of times, and the words the planner shows when it says no. Apart from the
// search because it is chemistry (which recipe strips or attacks what), the search is bookkeeping.

import { siteOfGroup } from '../check/pg-site';
import type { CheckRules } from '../check/types';
import { freedEarlyAt, maskedAt, recipeConditions } from './exposure';
import { prefersOver } from './recipes';
import type { Need, Option } from './types';

// Keys join with \u0001: intermediate ids are the chemist's own and may hold any other character.
const knownRemovalKeys = new WeakMap<Option, string>();
export const removalKey = (option: Option) => {
	let key = knownRemovalKeys.get(option);
	if (key === undefined) {
		knownRemovalKeys.set(
			option,
			(key = `${option.removeAt}\u0001${[...option.removal.conditions].sort().join('+')}`)
		);
	}
	return key;
};
/** Needs that take the same PG by the same recipe at the same gap share one step (five ketones, one ketalisation; DHP on two alcohols). */
export const installKey = (need: Need, option: Option) =>
	`${need.installAt}\u0001${option.pg}\u0001${option.install.reagents}`;

/** Whether two chosen options can share a route: neither one's install or removal strips the other's PG. */
export function compatible(
	rules: CheckRules,
	needs: Need[],
	x: number,
	ox: Option,
	y: number,
	oy: Option
): boolean {
	return (
		conflict(rules, needs, x, ox, y, oy) === null && conflict(rules, needs, y, oy, x, ox) === null
	);
}

/**
 * Why need a's install or removal, done with option oa, cannot share the route with need b's
 * option ob (it strips ob's PG, or attacks b's group while it is free), or null when it can.
 * E.g. "putting the acetonide on (2,2-dimethoxypropane, PPTS, acetone) would strip the dioxolane".
 */
export function conflict(
	rules: CheckRules,
	needs: Need[],
	a: number,
	oa: Option,
	b: number,
	ob: Option
): string | null {
	const na = needs[a]!;
	const nb = needs[b]!;
	const sameRemoval = removalKey(oa) === removalKey(ob);
	const sameInstall = installKey(na, oa) === installKey(nb, ob);
	// No closures and no words unless there is a conflict: the search asks this tens of thousands of times.
	// A neighbour still free at this install whose group the recipe also takes gets the PG too,
	// unless it shares the step or the recipe takes a's group first (TBDPSCl: primary before secondary).
	if (
		!sameInstall &&
		nb.installAt === na.installAt &&
		!maskedAt(needs, b, na.installAt, a, 'install', ob.removeAt)
	) {
		const taken = nb.members.filter((g) => oa.selectivity.takes.includes(g));
		if (taken.some((g) => !prefersOver(oa.selectivity, na.group, g))) {
			return `putting the ${oa.pg} on (${oa.install.reagents}) would also put ${oa.pg} on the ${rules.groupLabel(nb.group)} beside it unless both take the same protecting group`;
		}
	}
	// A group whose mask came off early is free again for a's install or removal.
	if (
		freedEarlyAt(nb, ob.removeAt, na.installAt) &&
		nb.members.some((g) => reacts(rules, g, oa.install))
	) {
		return `putting the ${oa.pg} on (${oa.install.reagents}) would attack the ${rules.groupLabel(nb.group)} once its ${ob.pg} is off`;
	}
	if (
		freedEarlyAt(nb, ob.removeAt, oa.removeAt) &&
		nb.members.some((g) => reacts(rules, g, oa.removal))
	) {
		return `taking the ${oa.pg} off (${oa.removal.reagents}) would attack the ${rules.groupLabel(nb.group)} once its ${ob.pg} is off`;
	}
	if (
		maskedAt(needs, b, na.installAt, a, 'install', ob.removeAt) &&
		!sameInstall &&
		strips(rules, oa.install, ob.pg, nb.group)
	) {
		return `putting the ${oa.pg} on (${oa.install.reagents}) would strip the ${ob.pg} on the ${rules.groupLabel(nb.group)}`;
	}
	if (
		maskedAt(needs, b, oa.removeAt, a, 'removal', ob.removeAt) &&
		!sameRemoval &&
		strips(rules, oa.removal, ob.pg, nb.group)
	) {
		return `taking the ${oa.pg} off (${oa.removal.reagents}) would strip the ${ob.pg} on the ${rules.groupLabel(nb.group)}`;
	}
	return null;
}

// Judged by the recipe's own reagents, as the check judges the step it becomes (TBAF is not all
// of `fluoride`, HF·pyridine not all of `acid-mild`).
type RecipeText = { reagents: string; conditions: string[] };

function reacts(rules: CheckRules, group: string, recipe: RecipeText): boolean {
	for (const c of recipeConditions(rules, recipe)) {
		if (rules.reactivity(group, c.id, c.reagents)?.rating === 'reacts') {
			return true;
		}
	}
	return false;
}

function strips(rules: CheckRules, recipe: RecipeText, pg: string, group: string): boolean {
	const site = siteOfGroup(group);
	for (const c of recipeConditions(rules, recipe)) {
		if (rules.stability(pg, c.id, c.reagents, site).rating === 'labile') {
			return true;
		}
	}
	return false;
}
