import type { RuleOverrideAnswer } from '../api/answers';
import { loadRuleTable } from '../rules/table';
import { FREE_GROUP_IDS, PROTECTING_GROUP_IDS } from '../rules/ids';
import { ruleGrid, type OverrideChoices, type RuleGrid } from '../team-rules/grid';
import { classWideLayer } from '../team-rules/layer';
import { routeMapLabels } from './route-map-labels';

let choices: OverrideChoices | null = null;

/** Built once per process: the bundled rule table does not change while it runs. */
export function overrideChoices(): OverrideChoices {
	choices ??= buildChoices();
	return choices;
}

function buildChoices(): OverrideChoices {
	const labels = routeMapLabels();
	const table = loadRuleTable();
	return {
		subjects: [
			...PROTECTING_GROUP_IDS.map((id) => ({
				value: id,
				label: `${id} · ${labels.protectingGroups.get(id) ?? id} (protecting group)`
			})),
			...FREE_GROUP_IDS.map((id) => ({
				value: id,
				label: `${labels.groups.get(id) ?? id} (free group)`
			}))
		],
		conditions: labels.conditions.map(({ id, label }) => ({ value: id, label })),
		reagents: table.reagents
			.filter((r) => r.conditions.length > 0 || r.when)
			.map((r) => r.name)
			.sort((a, b) => a.localeCompare(b))
	};
}

/**
 * The rule table as the team sees it: the class-wide overrides layered on the bundled table.
 * TODO(lead, issue 16): use the engine's `teamRuleLayer(teamId)` here once rules-engine lands.
 */
export function teamRuleGrid(teamName: string, overrides: RuleOverrideAnswer[]): RuleGrid {
	const table = loadRuleTable(classWideLayer(teamName, overrides));
	return ruleGrid(table, routeMapLabels().protectingGroups);
}
