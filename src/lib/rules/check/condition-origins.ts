// Where each of a step's condition classes comes from: the named reagents that bring it, or the
// chemist's hand. The clash check and the planner both read a step this way, so the rule lives
// here once.

import type { Bringer } from './messages';
import type { ReagentMatch } from './types';

/** One condition class of a step and what brings it (see `conditionOrigins`). */
export type ConditionOrigin = { id: string; reagents: Bringer[]; explicit: boolean };

/**
 * The step's classes in order (explicit first, then the reagents' own), each with the reagents
 * that bring it, e.g. explicit `['base-amine']` with `'TBSCl, imidazole'` → `base-amine` brought
 * by imidazole, not explicit. An explicit class that a named reagent also brings is judged by that
 * reagent; only a class no reagent brings stands for the whole class (`explicit: true`).
 */
export function conditionOrigins(
	explicit: readonly string[],
	classified: { conditions: readonly string[]; matched: readonly ReagentMatch[] }
): ConditionOrigin[] {
	const ids = [...new Set([...explicit, ...classified.conditions])];
	return ids.map((id) => {
		const bringers = new Map<string, Bringer>();
		for (const m of classified.matched) {
			if (m.conditions.includes(id) && !bringers.has(m.reagent)) {
				bringers.set(m.reagent, {
					reagent: m.reagent,
					context: m.context && { reagent: m.context.reagent, why: m.context.why }
				});
			}
		}
		return {
			id,
			reagents: [...bringers.values()],
			explicit: explicit.includes(id) && bringers.size === 0
		};
	});
}
