// The rule table as a team sees it, shaped for the rules page: one row per protecting group, one
// rating per condition class, and which of those cells the team's layer decided.

import type { ConditionId, ProtectingGroupId, StabilityRating } from '../rules/ids';
import type { RuleTable } from '../rules/table-types';

export type RuleGridRow = {
	id: ProtectingGroupId;
	label: string;
	/** In the order of `RuleGrid.conditions`. */
	ratings: StabilityRating[];
	/** The classes whose rating came from the team's layer (a finer class inherits its broader one's). */
	overridden: ConditionId[];
};
export type RuleGrid = { conditions: { id: ConditionId; label: string }[]; rows: RuleGridRow[] };

/** What the form's lists offer: subjects with their names, condition classes, reagent names. */
export type OverrideChoices = {
	subjects: { value: string; label: string }[];
	conditions: { value: string; label: string }[];
	/** Reagents that bring a class (solvents and work-up materials cannot be overridden). */
	reagents: string[];
};

/**
 * Every PG's rating under every class, with the PGs' names from `labels` (id → name), e.g.
 * `ruleGrid(loadRuleTable(layer), new Map([['TBS', 'TBS ether']])).rows[0].ratings`.
 */
export function ruleGrid(table: RuleTable, labels: ReadonlyMap<string, string>): RuleGrid {
	const conditions = table.conditions.map(({ id, label }) => ({ id, label }));
	const rows = table.protectingGroups.map((pg): RuleGridRow => {
		const answers = conditions.map(({ id }) => table.stabilityOf(pg.id, id));
		return {
			id: pg.id,
			label: labels.get(pg.id) ?? pg.id,
			ratings: answers.map((a) => a.rating),
			overridden: conditions.filter((_, i) => answers[i]!.layer === 'override').map((c) => c.id)
		};
	});
	return { conditions, rows };
}
