// Which protecting groups could mask one need, judged one by one: survives every step it must
// sit through, goes on without attacking what else is free, comes off without harming what stays.

import { perceptionRules } from '../../chem/patterns';
import { readStructure } from '../../chem/parse';
import { stereocentres } from '../../chem/properties';
import { TEAM_RULE_PREFIX } from '../../team-rules/contract';
import { teamRule } from '../check/messages';
import { siteOfGroup } from '../check/pg-site';
import type { CheckRules } from '../check/types';
import type { RuleTable } from '../table';
import { harm } from './exposure';
import type { RouteTree } from './tree';
import { preferenceRank } from '../preferences';
import {
	drawnGroups,
	installRecipes,
	recipeDrawbacks,
	removalRecipes,
	type Recipe
} from './recipes';
import type { Drawback, Need, Option } from './types';

// How hard a condition class is on a molecule, for ranking only (why: a chemist prefers the
// milder of two otherwise equal plans). Unlisted classes count 1.
const HARSHNESS: Record<string, number> = {
	'acid-strong': 3,
	'base-strong': 3,
	'hydride-strong': 3,
	organometallic: 3,
	'dissolving-metal': 3,
	'oxidant-strong': 3,
	'lewis-acid': 2,
	'base-aqueous': 2,
	heat: 2,
	'oxidant-electron-transfer': 2
};
/** Summed harshness of condition classes, e.g. `harshnessOf(['acid-strong', 'fluoride'])` → 4. */
export const harshnessOf = (conditions: string[]) =>
	conditions.reduce((sum, id) => sum + (HARSHNESS[id] ?? 1), 0);

export type Judged = {
	pg: string;
	options: Option[];
	rejected: string | null;
	killedAt?: string;
	/** The team's override rejected it: the rationale names such PGs first. */
	byTeamRule?: true;
};

/**
 * Where a PG on `need` may come off, latest first, with the cautions it collects on the way: from
 * where it must be free again back to the product of the last step that attacks the group, as far
 * as the PG survives the steps in between. Empty, with the step that removes it, when it cannot
 * even reach the end of the last attack.
 */
function removalPoints(
	rules: CheckRules,
	tree: RouteTree,
	need: Need,
	pg: string
): {
	points: { node: string; cautions: number }[];
	killer?: { step: string; condition: string; teamRule?: string };
} {
	const on = need.path.indexOf(need.installAt);
	const earliest = need.path.indexOf(need.removableFrom);
	const latest = need.path.indexOf(need.freeAt);
	const points: { node: string; cautions: number }[] = [];
	let cautions = 0;
	for (let at = on; at <= latest; at++) {
		if (at >= earliest) {
			points.unshift({ node: need.path[at]!, cautions });
		}
		if (at === latest) {
			break;
		}
		const step = tree.next.get(need.path[at]!)!;
		for (const c of tree.conditions.get(step.id)!) {
			const answer = rules.stability(pg, c.id, c.reagents, siteOfGroup(need.group));
			const rating = answer.rating;
			if (rating === 'labile') {
				if (points.length) {
					return { points };
				}
				const killer: { step: string; condition: string; teamRule?: string } = {
					step: step.id,
					condition: c.id
				};
				if (answer.layer === 'override' && answer.reason) {
					killer.teamRule = answer.reason;
				}
				return { points, killer };
			}
			if (rating === 'caution') {
				cautions++;
			}
		}
	}
	return { points };
}

/** An install or removal recipe judged on the molecule: what it attacks, what it brings. */
type Judgement = { recipe: Recipe; cautions: number; drawbacks: Drawback[]; harshness: number };

/**
 * Every candidate PG for `needs[index]` with its admissible options or why it fails, e.g. Bn for
 * an alcohol → "Bn rejected: … hydrogenation …". Every install recipe that takes the group and
 * every removal recipe is tried; an option is one install recipe, one removal recipe and one
 * removal point, and options another of the same PG beats on every count are dropped.
 */
export function judgeCandidates(
	table: RuleTable,
	rules: CheckRules,
	tree: RouteTree,
	needs: Need[],
	index: number
): Judged[] {
	const need = needs[index]!;
	const protects = new Map(perceptionRules().protectingGroups.map((pg) => [pg.id, pg.protects]));
	const rows = table.protectingGroups.filter((row) => protects.get(row.id)?.includes(need.group));
	let chiral: boolean | undefined;
	const isChiralSubstrate = () => (chiral ??= isChiral(tree.byId.get(need.installAt)!.structure));
	return rows.map((row): Judged => {
		const transform = row.install.transforms.find((t) =>
			(t.groups as readonly string[]).includes(need.group)
		)?.smarts;
		if (!transform) {
			return {
				pg: row.id,
				options: [],
				rejected: `${row.id} rejected: the rule table has no install transform to draw it on a ${rules.groupLabel(need.group)}`
			};
		}
		const { points, killer } = removalPoints(rules, tree, need, row.id);
		if (killer) {
			const by = killer.teamRule ? ` (${teamRule(killer.teamRule).slice(0, -1)})` : '';
			const rejected = `${row.id} rejected: the ${rules.conditionLabel(killer.condition).toLowerCase()} conditions of ${tree.stepName(killer.step)} would remove it${by}`;
			const judged: Judged = { pg: row.id, options: [], rejected, killedAt: killer.step };
			return killer.teamRule ? { ...judged, byTeamRule: true } : judged;
		}
		const recipes = installRecipes(row, need.group);
		if (recipes.length === 0) {
			return {
				pg: row.id,
				options: [],
				rejected: `${row.id} rejected: none of its install recipes takes a ${rules.groupLabel(need.group)}`
			};
		}
		const drawn = drawnGroups(row);
		let firstInstallProblem = '';
		const installs = bestOfEach(recipes, (recipe) => {
			const installHarm = harm(
				rules,
				tree,
				needs,
				index,
				need.installAt,
				'install',
				recipe,
				row.id,
				drawn
			);
			if (!installHarm.blocked) {
				return judged(table, rules, recipe, installHarm.cautions, 'install');
			}
			firstInstallProblem ||= `installing it (${recipe.reagents}) ${installHarm.blocked}`;
			return null;
		});
		if (installs.length === 0) {
			return rejectedFor(row.id, firstInstallProblem);
		}
		// The PG's own drawbacks; a new stereocentre matters only on a chiral substrate, which it
		// turns into a mixture of diastereomers.
		const own = row.drawbacks.filter((d) => d.kind !== 'new-stereocentre' || isChiralSubstrate());
		const preference = preferenceRank(table, need.group, row.id);
		const removals = removalRecipes(row);
		const options: Option[] = [];
		let firstRemovalProblem = '';
		for (const point of points) {
			const here: Option[] = [];
			for (const removal of bestOfEach(removals, (recipe) => {
				const removalHarm = harm(
					rules,
					tree,
					needs,
					index,
					point.node,
					'removal',
					recipe,
					row.id,
					[]
				);
				if (removalHarm.blocked) {
					firstRemovalProblem ||= `removing it (${recipe.reagents}) ${removalHarm.blocked}`;
					return null;
				}
				return judged(table, rules, recipe, removalHarm.cautions, 'removal');
			})) {
				for (const install of installs) {
					const drawbacks = [...own, ...install.drawbacks, ...removal.drawbacks];
					here.push({
						pg: row.id,
						transform,
						install: {
							reagents: install.recipe.reagents,
							conditions: [...install.recipe.conditions]
						},
						removal: {
							reagents: removal.recipe.reagents,
							conditions: [...removal.recipe.conditions]
						},
						removeAt: point.node,
						cautions: point.cautions + install.cautions + removal.cautions,
						harshness: install.harshness + removal.harshness,
						drawbacks,
						preference,
						why: drawbacks.map((d) => sentence(d.note)).join(' '),
						selectivity: { takes: install.recipe.takes, prefers: install.recipe.prefers }
					});
				}
			}
			options.push(...undominated(here));
		}
		if (options.length === 0) {
			return rejectedFor(row.id, firstRemovalProblem);
		}
		return { pg: row.id, options, rejected: null };
	});
}

/** A PG rejected for `problem`, marked when the team's rule decided it (its words say "team rule:"). */
function rejectedFor(pg: string, problem: string): Judged {
	const judged: Judged = { pg, options: [], rejected: `${pg} rejected: ${problem}` };
	return problem.includes(TEAM_RULE_PREFIX) ? { ...judged, byTeamRule: true } : judged;
}

const sentence = (note: string) => (/[.!?]$/.test(note) ? note : `${note}.`);

function judged(
	table: RuleTable,
	rules: CheckRules,
	recipe: Recipe,
	cautions: number,
	role: 'install' | 'removal'
): Judgement {
	return {
		recipe,
		cautions,
		drawbacks: recipeDrawbacks(table, rules, recipe.reagents, role),
		harshness: harshnessOf(recipe.conditions)
	};
}

/**
 * Per method (install) or set of condition classes (removal), the recipe that fits best (fewest
 * drawbacks, then cautions, the usual one on a tie): such recipes are interchangeable for
 * orthogonality, so only the best is worth searching, e.g. NaH/BnBr with TBAI only if it is better.
 */
function bestOfEach(recipes: Recipe[], judge: (recipe: Recipe) => Judgement | null): Judgement[] {
	const best = new Map<string, Judgement>();
	for (const recipe of recipes) {
		const result = judge(recipe);
		if (!result) {
			continue;
		}
		const held = best.get(recipe.family);
		if (
			!held ||
			result.drawbacks.length < held.drawbacks.length ||
			(result.drawbacks.length === held.drawbacks.length && result.cautions < held.cautions)
		) {
			best.set(recipe.family, result);
		}
	}
	return [...best.values()];
}

/**
 * Drops options of one PG and removal point that another beats on drawbacks, cautions and
 * harshness while taking it off the same way and putting it on with no class the other lacks
 * (so it can clash with nothing the other avoids), e.g. NaH/BnBr beside an ester once the
 * imidate recipe is as good. Keeps the list short enough for the joint search.
 */
function undominated(options: Option[]): Option[] {
	const removalOf = (o: Option) => [...o.removal.conditions].sort().join('+');
	const beats = (a: Option, b: Option) =>
		removalOf(a) === removalOf(b) &&
		a.install.conditions.every((c) => b.install.conditions.includes(c)) &&
		a.drawbacks.length <= b.drawbacks.length &&
		a.cautions <= b.cautions &&
		a.harshness <= b.harshness &&
		(a.drawbacks.length < b.drawbacks.length ||
			a.cautions < b.cautions ||
			a.harshness < b.harshness ||
			a.install.conditions.length < b.install.conditions.length);
	return options.filter((o) => !options.some((other) => other !== o && beats(other, o)));
}

const isChiral = (structure: string) =>
	stereocentres(readStructure(structure, { stereo: true, warnings: false }).molecule).length > 0;
