// A PG's install and removal recipes as the planner weighs them: every reagent string of every
// method is its own recipe (TBSCl/imidazole and TBSOTf/2,6-lutidine; NaH/BnBr and the
// trichloroacetimidate), each with the groups it takes and the drawbacks its reagents bring.

import type { CheckRules } from '../check/types';
import type { ProtectingGroupConditions } from '../schemas';
import type { RuleTable } from '../table';
import type { Drawback } from './types';

/** Which groups an install recipe takes first, e.g. TBDPSCl: a primary alcohol over a secondary one. */
export type Preference = { group: string; over: readonly string[]; reason: string };

/** One recipe as written into an added step, e.g. `{ reagents: 'TBSCl, imidazole, DMF', … }`. */
export type Recipe = {
	reagents: string;
	conditions: string[];
	/** Install only: the free groups it converts when present (default: all the PG draws). */
	takes: readonly string[];
	prefers: readonly Preference[];
	/** Recipes of one family differ only in wording for the search: one install method, or one set of removal classes. */
	family: string;
};

/** The groups a PG's install transforms draw, e.g. TBS → the alcohols and phenol. */
export const drawnGroups = (row: ProtectingGroupConditions): string[] => [
	...new Set(row.install.transforms.flatMap((t) => t.groups as readonly string[]))
];

/** The install recipes of a PG that take `group`, usual one first, e.g. TBS on a tertiary alcohol → only the triflate. */
export function installRecipes(row: ProtectingGroupConditions, group: string): Recipe[] {
	const drawn = drawnGroups(row);
	return row.install.methods.flatMap((method, i) => {
		const takes = (method.takes as readonly string[] | undefined) ?? drawn;
		if (!takes.includes(group)) {
			return [];
		}
		return method.reagents.map((reagents) => ({
			reagents,
			conditions: [...method.conditions],
			takes,
			prefers: method.prefers,
			family: `${i}`
		}));
	});
}

/** Every removal recipe of a PG, one per reagent string, e.g. TBS → TBAF, HF·pyridine, Et3N·3HF, … */
export const removalRecipes = (row: ProtectingGroupConditions): Recipe[] =>
	row.remove.flatMap((method) => {
		const family = [...method.conditions].sort().join('+');
		return method.reagents.map((reagents) => ({
			reagents,
			conditions: [...method.conditions],
			takes: [],
			prefers: [],
			family
		}));
	});

/** Whether `recipe` takes `first` before `other`, e.g. TBDPSCl: a primary before a secondary alcohol. */
export const prefersOver = (
	recipe: Pick<Recipe, 'prefers'>,
	first: string,
	other: string
): Preference | undefined =>
	recipe.prefers.find((p) => p.group === first && p.over.includes(other));

/**
 * The concerns of the reagents a recipe names (rules/reagents.json `concerns`), as drawbacks, e.g.
 * "MOMCl, DIPEA" → `[{ kind: 'carcinogen', note: 'MOMCl (to put it on) is a carcinogen' }]`.
 */
export function recipeDrawbacks(
	table: RuleTable,
	rules: CheckRules,
	text: string,
	role: 'install' | 'removal'
): Drawback[] {
	let known = drawbacksByRules.get(rules);
	if (!known) {
		drawbacksByRules.set(rules, (known = new Map()));
	}
	const key = `${role}\u0001${text}`;
	let drawbacks = known.get(key);
	if (!drawbacks) {
		known.set(key, (drawbacks = readDrawbacks(table, rules, text, role)));
	}
	return drawbacks;
}

// Per rule view (a team's layered table gets its own), as the same recipes recur for every need.
const drawbacksByRules = new WeakMap<CheckRules, Map<string, Drawback[]>>();

function readDrawbacks(
	table: RuleTable,
	rules: CheckRules,
	text: string,
	role: 'install' | 'removal'
): Drawback[] {
	const names = new Set(rules.classify(text).matched.map((m) => m.reagent));
	const drawbacks: Drawback[] = [];
	for (const name of names) {
		const row = reagentRow(table, name);
		for (const kind of row?.concerns ?? []) {
			drawbacks.push({
				kind,
				note: `${name} (to ${role === 'install' ? 'put it on' : 'take it off'}) ${CONCERN_WORDS[kind]}`
			});
		}
	}
	return drawbacks;
}

const CONCERN_WORDS: Record<string, string> = {
	carcinogen: 'is a carcinogen',
	'toxic-metal': 'leaves toxic metal waste',
	'highly-toxic': 'is highly toxic',
	explosive: 'can explode',
	pyrophoric: 'ignites in air'
};

// Reagent rows by name, per table (a team's layered table is a new object).
const rowsByTable = new WeakMap<RuleTable, Map<string, RuleTable['reagents'][number]>>();
function reagentRow(table: RuleTable, name: string) {
	let rows = rowsByTable.get(table);
	if (!rows) {
		rowsByTable.set(table, (rows = new Map(table.reagents.map((r) => [r.name, r]))));
	}
	return rows.get(name);
}
