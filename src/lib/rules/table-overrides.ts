/**
 * How a team's override rows are found for a cell of the table, and how per-reagent answers are
 * combined: apart from table.ts, which decides the order (reagent row, class row, defaults).
 */
import type { RuleOverrides } from './overrides';
import type { ReactivityAnswer, StabilityAnswer } from './table-types';
import { REACTIVITY_SEVERITY, STABILITY_SEVERITY } from './table-reagent-ratings';

type StabilityRow = RuleOverrides['stability'][number];
type ReactivityRow = RuleOverrides['reactivity'][number];

/** The key of one overridden cell; a class-wide row has no reagent, e.g. `TBS␀fluoride␀`. */
export const cellKey = (subject: string, condition: string, reagent = '') =>
	`${subject}\u0000${condition}\u0000${reagent}`;

/** The layer's rows by cell, e.g. `stability.get(cellKey('TBS', 'fluoride', 'TBAF'))`. */
export function indexOverrides(overrides: RuleOverrides | null) {
	return {
		stability: new Map<string, StabilityRow>(
			(overrides?.stability ?? []).map((row) => [
				cellKey(row.protectingGroup, row.condition, row.reagent),
				row
			])
		),
		reactivity: new Map<string, ReactivityRow>(
			(overrides?.reactivity ?? []).map((row) => [
				cellKey(row.group, row.condition, row.reagent),
				row
			])
		)
	};
}

/** The worst of several reagents' answers (the first on a tie), e.g. TBAF's `labile` over `stable`. */
export function worstStability(answers: StabilityAnswer[]): StabilityAnswer {
	return answers.reduce((worst, next) =>
		STABILITY_SEVERITY[next.rating] > STABILITY_SEVERITY[worst.rating] ? next : worst
	);
}

/** The worst of several reagents' answers; `undefined` (no known problem) counts least. */
export function worstReactivity(
	answers: (ReactivityAnswer | undefined)[]
): ReactivityAnswer | undefined {
	const severity = (answer: ReactivityAnswer | undefined) =>
		answer ? REACTIVITY_SEVERITY[answer.rating] : 0;
	return answers.reduce((worst, next) => (severity(next) > severity(worst) ? next : worst));
}
