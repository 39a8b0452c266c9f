// The joint choice: one option per need, found by depth-first branch and bound with lower bounds
// on the steps still to come. What a choice costs is cost.ts; whether two options can share a
// route is conflict.ts; this file holds only the search and its bookkeeping.

import type { CheckRules } from '../check/types';
import { compatible, installKey, removalKey } from './conflict';
import { optionScore, scoreOf, type Choice, type Cost } from './cost';
import type { Need, Option } from './types';

/** Counts of keys in use, so a step shared by several needs is counted once. */
class KeyCounts {
	readonly #counts = new Map<string, number>();
	get size(): number {
		return this.#counts.size;
	}
	has(key: string): boolean {
		return this.#counts.has(key);
	}
	add(key: string): void {
		this.#counts.set(key, (this.#counts.get(key) ?? 0) + 1);
	}
	remove(key: string): void {
		const left = this.#counts.get(key)! - 1;
		if (left === 0) {
			this.#counts.delete(key);
		} else {
			this.#counts.set(key, left);
		}
	}
}

/**
 * Up to `keep` cheapest joint choices with distinct PG assignments, cheapest first, ties in
 * candidate order (stable), e.g. dioxolane for a ketone before the dimethyl acetal, which is fragile.
 */
export function searchChoices(
	rules: CheckRules,
	needs: Need[],
	lists: Option[][],
	keep: number
): Choice[] {
	// Cheapest first, so good choices are found early and bound the rest.
	const options = lists.map((list) => [...list].sort((a, b) => optionScore(a) - optionScore(b)));
	const best: Choice[] = [];
	const chosen: number[] = [];
	const installKeys = options.map((list, x) => list.map((o) => installKey(needs[x]!, o)));
	const removalKeys = options.map((list) => list.map((o) => removalKey(o)));
	// Pairwise compatibility is asked again and again on the way down: work each pair out once.
	const pairs = new Map<number, Uint8Array>();
	const fits = (x: number, i: number, y: number, j: number) => {
		const key = x * needs.length + y;
		let table = pairs.get(key);
		if (!table) {
			pairs.set(key, (table = new Uint8Array(options[x]!.length * options[y]!.length)));
		}
		const cell = i * options[y]!.length + j;
		if (table[cell] === 0) {
			table[cell] = compatible(rules, needs, x, options[x]![i]!, y, options[y]![j]!) ? 1 : 2;
		}
		return table[cell] === 1;
	};
	// Lower bounds for the needs from `depth` on: their cheapest options, one install per install
	// class (see `installClasses`) and the removals no choice so far already brings (see `removalsStillToCome`).
	const optionScores = options.map((list) => list.map(optionScore));
	const floor = optionScores.map((scores) => Math.min(...scores));
	const rest = floor.map((_, i) => floor.slice(i).reduce((sum, v) => sum + v, 0));
	const classOf = installClasses(needs, installKeys);
	const classesFrom = needs.map((_, d) => [...new Set(classOf.slice(d))]);
	const windows = needs.map((n) =>
		n.path.slice(n.path.indexOf(n.removableFrom), n.path.indexOf(n.freeAt) + 1)
	);
	const installs = new KeyCounts();
	const removals = new KeyCounts();
	const installClassesUsed = new KeyCounts();
	const removalPlaces = new KeyCounts();
	const worst = () => (best.length < keep ? Infinity : best[best.length - 1]!.score);
	// Each later need comes off somewhere in its window: windows of one place that no removal so far
	// covers need a step each, and any other uncovered window at least one more.
	const removalsStillToCome = (depth: number) => {
		const single = new Set<string>();
		let other = false;
		for (let d = depth; d < needs.length; d++) {
			const window = windows[d]!;
			if (window.some((node) => removalPlaces.has(node))) {
				continue;
			}
			if (window.length === 1) {
				single.add(window[0]!);
			} else {
				other = true;
			}
		}
		const otherUncovered =
			other &&
			windows
				.slice(depth)
				.some(
					(w) => w.length > 1 && !w.some((node) => removalPlaces.has(node) || single.has(node))
				);
		return single.size + (otherUncovered ? 1 : 0);
	};
	const stepsStillToCome = (depth: number) =>
		depth === needs.length
			? 0
			: classesFrom[depth]!.filter((c) => !installClassesUsed.has(c)).length +
				removalsStillToCome(depth);
	const stepScore = (steps: number) =>
		scoreOf({ addedSteps: steps, drawbacks: 0, cautions: 0, preference: 0, harshness: 0 });
	const visit = (depth: number, below: number) => {
		const added = installs.size + removals.size;
		if (best.length >= keep) {
			// The steps still to come cost most to count: first try the bound without them.
			const known = stepScore(added) + below + (rest[depth] ?? 0);
			if (known >= worst() || known + stepScore(stepsStillToCome(depth)) >= worst()) {
				return;
			}
		}
		if (depth === needs.length) {
			const picked = chosen.map((i, x) => options[x]![i]!);
			const sum = (part: (o: Option) => number) => picked.reduce((total, o) => total + part(o), 0);
			const cost: Cost = {
				addedSteps: added,
				drawbacks: sum((o) => o.drawbacks.length),
				cautions: sum((o) => o.cautions),
				preference: sum((o) => o.preference),
				harshness: sum((o) => o.harshness)
			};
			record({ ...cost, options: picked, score: scoreOf(cost) });
			return;
		}
		const list = options[depth]!;
		const scores = optionScores[depth]!;
		const steps = stepScore(installs.size + removals.size);
		for (let i = 0; i < list.length; i++) {
			// Options come cheapest first and adding one never removes a step: once one cannot
			// beat the worst kept choice, none after it can.
			if (best.length >= keep && steps + below + scores[i]! + (rest[depth + 1] ?? 0) >= worst()) {
				break;
			}
			let fitsAll = true;
			for (let j = 0; j < depth && fitsAll; j++) {
				fitsAll = fits(depth, i, j, chosen[j]!);
			}
			if (!fitsAll) {
				continue;
			}
			const option = list[i]!;
			const install = installKeys[depth]![i]!;
			const removal = removalKeys[depth]![i]!;
			const installClass = classOf[depth]!;
			chosen.push(i);
			installs.add(install);
			removals.add(removal);
			installClassesUsed.add(installClass);
			removalPlaces.add(option.removeAt);
			visit(depth + 1, below + scores[i]!);
			removalPlaces.remove(option.removeAt);
			installClassesUsed.remove(installClass);
			removals.remove(removal);
			installs.remove(install);
			chosen.pop();
		}
	};
	// Plans that differ only in which recipe takes the same PGs off read as one plan to a chemist:
	// keep the cheapest of each assignment, so the list offers real alternatives.
	const signatures: string[] = [];
	const record = (choice: Choice) => {
		const mine = signature(choice.options);
		const same = signatures.indexOf(mine);
		if (same >= 0) {
			if (best[same]!.score <= choice.score) {
				return;
			}
			best.splice(same, 1);
			signatures.splice(same, 1);
		}
		// Insert in score order, after equal scores: ties stay in the order they were found.
		let at = best.length;
		while (at > 0 && best[at - 1]!.score > choice.score) {
			at--;
		}
		best.splice(at, 0, choice);
		signatures.splice(at, 0, mine);
		if (best.length > keep) {
			best.pop();
			signatures.pop();
		}
	};
	visit(0, 0);
	return best;
}

/**
 * Install classes for the lower bound: needs at one place whose options could share an install
 * step (some install key in common, directly or through another need) form one class, and each
 * class needs a step of its own, e.g. two ketones with the same ketalisations on offer → one.
 * Keys of different classes never meet, so counting one step per class stays a lower bound.
 */
function installClasses(needs: Need[], installKeys: string[][]): string[] {
	const parent = needs.map((_, i) => i);
	const root = (i: number): number => (parent[i] === i ? i : (parent[i] = root(parent[i]!)));
	const holder = new Map<string, number>();
	installKeys.forEach((keys, i) => {
		for (const key of keys) {
			const other = holder.get(key);
			if (other === undefined) {
				holder.set(key, i);
			} else {
				parent[root(i)] = root(other);
			}
		}
	});
	return needs.map((need, i) => `${need.installAt}\u0001${root(i)}`);
}

const signature = (options: Option[]) => options.map((o) => o.pg).join('|');
