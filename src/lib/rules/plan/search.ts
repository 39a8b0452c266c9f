// The joint choice: one option per need, found by depth-first branch and bound. Cost is
// lexicographic — added steps, then cautions, then harshness — folded into one score.

import type { CheckRules } from '../check/types';
import { maskedAt } from './options';
import type { Need, Option } from './types';

export type Choice = { options: Option[]; score: number; addedSteps: number; cautions: number; harshness: number };

const removalKey = (need: Need, option: Option) => `${need.freeGap}|${[...option.removal.conditions].sort().join('+')}`;
/** Same-type groups that take the same PG at the same gap go on in one step (five ketones, one ketalisation). */
export const installKey = (need: Need, option: Option) => `${need.installGap}|${need.group}|${option.pg}|${option.install.reagents}`;
/** Lexicographic cost as one number, e.g. `scoreOf(2, 1, 3)` → 20103 (steps, then cautions, then harshness). */
export const scoreOf = (added: number, cautions: number, harshness: number) => added * 10_000 + cautions * 100 + harshness;

/** Whether two chosen options can share a route: neither one's install or removal strips the other's PG. */
function compatible(rules: CheckRules, needs: Need[], x: number, ox: Option, y: number, oy: Option): boolean {
	const strips = (a: number, oa: Option, b: number, ob: Option) => {
		const na = needs[a]!;
		const sameRemoval = removalKey(na, oa) === removalKey(needs[b]!, ob);
		const sameInstall = installKey(na, oa) === installKey(needs[b]!, ob);
		// A same-type neighbour left free at this install would be attacked by it, unless it shares the step.
		if (!sameInstall && needs[b]!.installGap === na.installGap && needs[b]!.group === na.group) {
			if (oa.install.conditions.some((c) => rules.reactivity(na.group, c)?.rating === 'reacts')) return true;
		}
		const exposed = [
			...(maskedAt(needs, b, na.installGap, a, 'install') && !sameInstall ? oa.install.conditions : []),
			...(maskedAt(needs, b, na.freeGap, a, 'removal') && !sameRemoval ? oa.removal.conditions : [])
		];
		return exposed.some((c) => rules.stability(ob.pg, c, []).rating === 'labile');
	};
	return !strips(x, ox, y, oy) && !strips(y, oy, x, ox);
}

/** Up to `keep` cheapest joint choices, cheapest first, ties in candidate order (stable), e.g. dioxolane for a ketone before dimethyl acetal only if it is milder. */
export function searchChoices(rules: CheckRules, needs: Need[], options: Option[][], keep: number): Choice[] {
	const best: Choice[] = [];
	const chosen: Option[] = [];
	const worst = () => (best.length < keep ? Infinity : best[best.length - 1]!.score);
	// The cheapest option of each need from `depth` on: cautions and harshness still to come.
	const floor = options.map((list) => Math.min(...list.map((o) => scoreOf(0, o.cautions, o.harshness))));
	const rest = floor.map((_, i) => floor.slice(i).reduce((sum, v) => sum + v, 0));
	const visit = (depth: number, installs: Set<string>, removals: Set<string>, cautions: number, harshness: number) => {
		const added = installs.size + removals.size;
		// Later needs may share steps already counted, so only their cheapest ratings bound them.
		if (best.length >= keep && scoreOf(added, cautions, harshness) + (rest[depth] ?? 0) >= worst()) return;
		if (depth === needs.length) {
			best.push({ options: [...chosen], score: scoreOf(added, cautions, harshness), addedSteps: added, cautions, harshness });
			best.sort((a, b) => a.score - b.score);
			if (best.length > keep) best.pop();
			return;
		}
		for (const option of options[depth]!) {
			if (!chosen.every((other, j) => compatible(rules, needs, depth, option, j, other))) continue;
			const add = (set: Set<string>, key: string) => (set.has(key) ? set : new Set([...set, key]));
			chosen.push(option);
			visit(depth + 1, add(installs, installKey(needs[depth]!, option)), add(removals, removalKey(needs[depth]!, option)), cautions + option.cautions, harshness + option.harshness);
			chosen.pop();
		}
	};
	visit(0, new Set(), new Set(), 0, 0);
	return best;
}
