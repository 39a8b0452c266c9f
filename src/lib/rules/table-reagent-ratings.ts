/**
 * A default rating refined for the reagents that brought a condition class: a row's
 * `reagentRatings` name reagents whose own rating differs from the class's (the worst applies).
 * Apart from table.ts, which layers the team's overrides over these default answers.
 */
import type { ConditionId, ReactivityRowRating, StabilityRating } from './ids';
import type { ProtectingGroupConditions, ReactivityEntry, WhereOnEntry } from './schemas';
import type { StabilityAnswer } from './table-types';

/** How bad a PG's rating is, for picking the worst of several reagents' answers. */
export const STABILITY_SEVERITY: Record<StabilityRating, number> = {
	stable: 0,
	caution: 1,
	labile: 2
};

/**
 * The answer for the reagents that brought a class: each reagent its own entry where the row
 * names it, else the row's answer; the worst one applies. No starting value, so a reagent's own
 * rating may be milder than the row's (PPTS and TBDPS; TFA and a tertiary alcohol).
 */
function worstForReagents<A extends { rating: string }>(
	rowAnswer: A,
	reagents: readonly string[],
	own: (reagent: string) => A | undefined,
	severity: Readonly<Record<string, number>>
): A {
	if (reagents.length === 0) {
		return rowAnswer;
	}
	return reagents
		.map((name) => own(name) ?? rowAnswer)
		.reduce((worst, next) => (severity[next.rating]! > severity[worst.rating]! ? next : worst));
}

/** A PG's default rating under one class, refined for the reagents that brought it. */
export function withReagentRatings(
	row: ProtectingGroupConditions,
	condition: ConditionId,
	rating: StabilityRating,
	reagents: readonly string[],
	onSite?: WhereOnEntry
): StabilityAnswer {
	const classAnswer: StabilityAnswer = onSite
		? { rating, source: row.source, layer: 'default', reason: onSite.reason, site: onSite.site }
		: { rating, source: row.source, layer: 'default' };
	return worstForReagents(
		classAnswer,
		reagents,
		(name) => {
			const entry = row.reagentRatings.find((r) => r.reagent === name && r.condition === condition);
			return (
				entry && {
					rating: entry.rating,
					reason: entry.reason,
					source: row.source,
					layer: 'default'
				}
			);
		},
		STABILITY_SEVERITY
	);
}

/** How bad a free group's rating is (`none`: no known problem). */
export const REACTIVITY_SEVERITY: Record<ReactivityRowRating, number> = {
	none: 0,
	caution: 1,
	reacts: 2
};

/**
 * A free group's default rating under one class, refined for the reagents that brought it, e.g.
 * a tertiary alcohol under TFA alone is `none`, under TFA and H2SO4 the row's `caution`.
 */
export function reactivityForReagents(
	entry: ReactivityEntry,
	reagents: readonly string[]
): { rating: ReactivityRowRating; reason: string } {
	return worstForReagents<{ rating: ReactivityRowRating; reason: string }>(
		{ rating: entry.rating, reason: entry.reason },
		reagents,
		(name) => entry.reagentRatings.find((r) => r.reagent === name),
		REACTIVITY_SEVERITY
	);
}
