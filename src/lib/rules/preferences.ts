/**
 * The tie-break a chemist applies between otherwise equal plans: how far down the group type's
 * preference list (rules/preferences.json) a PG sits, e.g. TBS before TES for an alcohol.
 */
import type { RuleTable } from './table';

/** 0 for the first PG listed for the group; PGs not listed (or groups with no list) come after every listed one. */
export function preferenceRank(
	table: Pick<RuleTable, 'preferences'>,
	group: string,
	pg: string
): number {
	const row = table.preferences.find((r) => (r.groups as readonly string[]).includes(group));
	if (!row) {
		return 0;
	}
	const at = (row.order as readonly string[]).indexOf(pg);
	return at < 0 ? row.order.length : at;
}
