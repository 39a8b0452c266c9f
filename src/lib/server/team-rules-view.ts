import { loadRuleTable } from '../rules/table';
import { FREE_GROUP_IDS, PROTECTING_GROUP_IDS } from '../rules/ids';
import { ruleGrid, type OverrideChoices, type RuleGrid } from '../team-rules/grid';
import { OverrideLayerError } from '../rules/overrides';
import { teamRuleLayer } from './services/team-rules-layer';
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

/** The grid the rules page shows, and the rows that no longer fit the table, said plainly. */
export type TeamRuleView = { grid: RuleGrid; unfit: string[] };

/**
 * The rule table as the team's checks see it: the engine's own layer (`teamRuleLayer`), so the
 * page and the check read one mapping of stored rows. A layer that no longer fits the table makes
 * the team's checks answer 422; the page then shows the bundled table and names the rows instead.
 */
export async function teamRuleGrid(teamId: string): Promise<TeamRuleView> {
	const labels = routeMapLabels().protectingGroups;
	const layer = await teamRuleLayer(teamId);
	try {
		return { grid: ruleGrid(loadRuleTable(layer), labels), unfit: [] };
	} catch (failure) {
		if (!(failure instanceof OverrideLayerError)) {
			throw failure;
		}
		return { grid: ruleGrid(loadRuleTable(), labels), unfit: [...failure.problems] };
	}
}
