// A team's stored overrides as the rule table's override layer, for the rules page's grid.
// TODO(lead, issue 16): the rules-engine branch writes `teamRuleLayer(teamId)` for the check and
// the planner (it also applies reagent-specific rows); once it lands, the page should call it and
// this file should go, so the page and the engine read one mapping.

import {
	CONDITION_IDS,
	type ConditionId,
	type FreeGroupId,
	type ProtectingGroupId,
	type StabilityRating
} from '../rules/ids';
import type { RuleOverridesInput } from '../rules/overrides';
import type { GROUP_RATINGS } from './contract';
import type { RuleOverrideAnswer } from '../api/answers';
import { ratingsFor, subjectKind } from './validate';

type StoredOverride = Pick<
	RuleOverrideAnswer,
	'subject' | 'condition' | 'reagent' | 'rating' | 'reason' | 'source'
>;

/**
 * Class-wide rows as a layer, e.g. `classWideLayer('Bench team', [{ subject: 'TBS', condition:
 * 'acid-mild', rating: 'labile', … }])`. Reagent-specific rows are left out (a class cell cannot
 * show them), and so is a row the table no longer accepts, so an old row never breaks the page.
 */
export function classWideLayer(name: string, rows: StoredOverride[]): RuleOverridesInput {
	const stability: NonNullable<RuleOverridesInput['stability']> = [];
	const reactivity: NonNullable<RuleOverridesInput['reactivity']> = [];
	for (const row of rows) {
		const kind = subjectKind(row.subject);
		if (
			row.reagent ||
			!kind ||
			!ratingsFor(kind).includes(row.rating) ||
			!(CONDITION_IDS as readonly string[]).includes(row.condition)
		) {
			continue;
		}
		// The casts hold: the checks above have just matched the ids and the rating to the table's.
		const common = {
			condition: row.condition as ConditionId,
			reason: row.reason,
			source: row.source
		};
		if (kind === 'protecting-group') {
			stability.push({
				...common,
				protectingGroup: row.subject as ProtectingGroupId,
				rating: row.rating as StabilityRating
			});
		} else {
			reactivity.push({
				...common,
				group: row.subject as FreeGroupId,
				rating: row.rating as (typeof GROUP_RATINGS)[number]
			});
		}
	}
	return { name, stability, reactivity };
}
