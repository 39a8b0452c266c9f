// The cost of a joint choice of protecting groups. Cost is lexicographic — added steps, then
// drawbacks (the PGs' own and their recipes' reagents'), then bystander cautions, then the sourced
// preference rank, then harshness — folded into one score. Apart from the search (search.ts) because the rationale and the tests
// read the same cost without running a search.

import type { Option } from './types';

/** The cost of a joint choice, tier by tier (see `scoreOf`). */
export type Cost = {
	addedSteps: number;
	drawbacks: number;
	cautions: number;
	preference: number;
	harshness: number;
};
export type Choice = Cost & { options: Option[]; score: number };

// Each tier gets three decimal digits, so a lower tier never outweighs one step of a higher one
// (as long as a plan has under 1000 cautions, preference places or harshness points; 5 tiers stay below 2^53).
const TIER = 1000;
/**
 * Lexicographic cost as one number, e.g. `scoreOf({ addedSteps: 2, drawbacks: 0, cautions: 1,
 * preference: 0, harshness: 3 })` → 2_000_001_000_003.
 */
export const scoreOf = (cost: Cost) =>
	[cost.addedSteps, cost.drawbacks, cost.cautions, cost.preference, cost.harshness].reduce(
		(sum, tier) => sum * TIER + tier,
		0
	);
/** What one option adds to a plan below the step count. */
export const optionScore = (o: Option) =>
	scoreOf({
		addedSteps: 0,
		drawbacks: o.drawbacks.length,
		cautions: o.cautions,
		preference: o.preference,
		harshness: o.harshness
	});
