// The rule table (src/lib/rules) and the perception table (src/lib/chem) seen through the
// narrow `CheckRules` view the check reads.

import { perceptionRules } from '../../chem/patterns';
import type { ConditionId, FreeGroupId, PgSite, ProtectingGroupId } from '../ids';
import { loadRuleTable, type RuleTable } from '../table';
import type { CheckRules } from './types';

const lowerFirst = (text: string) =>
	/^[A-Z][a-z]/.test(text) ? text[0]!.toLowerCase() + text.slice(1) : text;

/** The check's view of a rule table (the defaults, or a team's layered table). */
export function checkRulesFrom(table: RuleTable = loadRuleTable()): CheckRules {
	const perception = perceptionRules();
	const groupLabels = new Map(perception.groups.map((g) => [g.id, g.label]));
	const pgLabels = new Map(perception.protectingGroups.map((pg) => [pg.id, pg.label]));
	const conditionIds = table.conditions.map((c) => c.id);
	let selective: SelectiveInstall[] | undefined;
	return {
		conditionIds,
		conditionLabel: (id) => table.condition(id as ConditionId).label,
		// The planner asks the same pairs thousands of times per route: the table is frozen, so
		// each answer is worked out once per view.
		stability: remembered((pg, condition, reagents = [], site) =>
			table.stabilityOf(
				pg as ProtectingGroupId,
				condition as ConditionId,
				reagents,
				site as PgSite | undefined
			)
		),
		protectingGroupLabel: (pg) => pgLabels.get(pg) ?? pg,
		reactivity: remembered((group, condition, reagents = []) => {
			// Perception may know groups the reactivity table has no row for: no row, no problem known.
			const answer = table.reactivityOf(group as FreeGroupId, condition as ConditionId, reagents);
			if (!answer) {
				return null;
			}
			const { rating, reason, source, usuallyMasked, layer } = answer;
			const said = usuallyMasked
				? { rating, reason, source, usuallyMasked }
				: { rating, reason, source };
			// Only the team's answers say their layer: a default answer keeps its old shape.
			return layer === 'override' ? { ...said, layer } : said;
		}),
		// Lower-case the first letter only, for mid-sentence use: "the free alkene (non-aromatic C=C)".
		groupLabel: (group) => lowerFirst(groupLabels.get(group) ?? group),
		installPreference: (reagents, condition, first, over) => {
			selective ??= selectiveInstalls(table);
			const found = selective.find(
				(s) =>
					s.first === first &&
					s.over.includes(over) &&
					s.condition === condition &&
					reagents.some((r) => s.reagents.has(r))
			);
			return found?.reason ?? null;
		},
		classify: (text) => {
			const result = table.conditionsForReagents(text);
			return {
				conditions: result.conditions,
				matched: result.matched,
				hazards: result.hazards,
				unknown: result.unknown
			};
		}
	};
}

/** One `prefers` entry of an install method, per class the method brings, with the reagents that bring it. */
type SelectiveInstall = {
	first: string;
	over: readonly string[];
	reason: string;
	condition: string;
	reagents: Set<string>;
};

/** The selective install recipes of a table, e.g. TBDPSCl (acylating): primary before secondary alcohol. */
function selectiveInstalls(table: RuleTable): SelectiveInstall[] {
	return table.protectingGroups.flatMap((row) =>
		row.install.methods.flatMap((method) => {
			if (method.prefers.length === 0) {
				return [];
			}
			const matched = method.reagents.flatMap((text) => table.conditionsForReagents(text).matched);
			return method.prefers.flatMap((p) =>
				method.conditions.map((condition) => ({
					first: p.group,
					over: p.over,
					reason: p.reason,
					condition,
					reagents: new Set(
						matched.filter((m) => m.conditions.includes(condition)).map((m) => m.reagent)
					)
				}))
			);
		})
	);
}

// Enough for every reagent set a busy server meets; past it, start afresh.
const REMEMBERED_REAGENT_SETS = 10_000;

/**
 * `answer` with its results kept by argument, e.g. `stability('TBS', 'fluoride', ['TBAF'])`.
 * The planner asks millions of times per route with a few dozen reagent arrays, so answers are
 * filed per reagent set (found by the array itself, else by its text) and then by id, class and
 * site in nested maps: no key string is built on the hot path.
 */
function remembered<R>(
	answer: (id: string, condition: string, reagents?: readonly string[], site?: string) => R
) {
	type Answers = Map<string, Map<string, Map<string, R>>>;
	const byText = new Map<string, Answers>();
	let byArray = new WeakMap<readonly string[], Answers>();
	const answersFor = (reagents: readonly string[]): Answers => {
		let answers = byArray.get(reagents);
		if (answers) {
			return answers;
		}
		const text = reagents.join('\u0001');
		answers = byText.get(text);
		if (!answers) {
			if (byText.size >= REMEMBERED_REAGENT_SETS) {
				byText.clear();
				byArray = new WeakMap();
			}
			answers = new Map();
			byText.set(text, answers);
		}
		byArray.set(reagents, answers);
		return answers;
	};
	return (id: string, condition: string, reagents: readonly string[] = [], site?: string): R => {
		const answers = answersFor(reagents);
		let byCondition = answers.get(id);
		if (!byCondition) {
			answers.set(id, (byCondition = new Map()));
		}
		let bySite = byCondition.get(condition);
		if (!bySite) {
			byCondition.set(condition, (bySite = new Map()));
		}
		const at = site ?? '';
		if (bySite.has(at)) {
			return bySite.get(at)!;
		}
		const result = answer(id, condition, reagents, site);
		bySite.set(at, result);
		return result;
	};
}
