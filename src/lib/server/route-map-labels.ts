import { perceptionRules } from '../chem/patterns';
import { loadRuleTable } from '../rules';
import type { ConditionId } from '../rules/ids';

/**
 * The readable names the route map shows for rule-table ids: condition classes (in table order,
 * for the "add a condition" list), free groups and protecting groups. They come with the route
 * page's load, a few kilobytes, instead of the browser downloading the whole rule table twice.
 */
export type RouteMapLabels = {
	conditions: { id: ConditionId; label: string }[];
	groups: Map<string, string>;
	protectingGroups: Map<string, string>;
};

let cached: RouteMapLabels | null = null;

/** The labels of the bundled rule table; built once per process (the table does not change). */
export function routeMapLabels(): RouteMapLabels {
	cached ??= build();
	return cached;
}

function build(): RouteMapLabels {
	// Group and protecting-group labels are validated with the perception half of the rule files.
	const { groups, protectingGroups } = perceptionRules();
	return {
		conditions: loadRuleTable().conditions.map(({ id, label }) => ({ id, label })),
		groups: new Map(groups.map(({ id, label }) => [id, label])),
		protectingGroups: new Map(protectingGroups.map(({ id, label }) => [id, label]))
	};
}
