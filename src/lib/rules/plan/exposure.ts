// What an added step exposes: which needs are masked at a place and moment, and what an install
// or removal recipe would attack among the free groups and the route's own PGs there.

import { perceiveText } from '../../chem/perception-cache';
import { teamRule } from '../check/messages';
import { siteOfGroup } from '../check/pg-site';
import type { CheckRules } from '../check/types';
import { prefersOver, type Recipe } from './recipes';
import { freeUnits } from './track';
import { stepConditions, type RouteTree } from './tree';
import type { Need } from './types';

/**
 * Whether need `other` is masked at intermediate `node` while need `index` is worked on there,
 * its mask coming off at `removeAt` (by default where it must be free again). At an intermediate
 * the installs run first (in need order) and the removals after, so a group that must come off
 * here can still shield its neighbour while the neighbour's PG goes on; amines go on before the
 * other groups there (`installsBefore`). E.g. a Boc amine freed
 * before step 3 is still masked while Fmoc goes on the other amine there. A need on another
 * branch of a convergent route is not in that intermediate at all.
 */
export function maskedAt(
	needs: Need[],
	other: number,
	node: string,
	index: number,
	phase: 'install' | 'removal',
	removeAt = needs[other]!.freeAt
): boolean {
	const y = needs[other]!;
	const here = y.path.indexOf(node);
	if (here < 0) {
		return false;
	}
	const on = y.path.indexOf(y.installAt);
	const off = y.path.indexOf(removeAt);
	if (phase === 'removal') {
		return on <= here && here <= off;
	}
	return (on < here || (on === here && installsBefore(needs, other, index))) && here <= off;
}

// N–H groups a chemist masks first where several go on at one intermediate: the carbamate
// reagents pick the nitrogen out, while a silyl chloride or benzyl bromide would also meet a free
// amine (an amino alcohol is N-Boc'd, then O-silylated: Wuts, Greene's Protective Groups in
// Organic Synthesis, 5th ed., ch. 7; Kocienski, Protecting Groups, 3rd ed., ch. 1 — from memory).
const NITROGEN_FIRST = new Set([
	'amine-primary',
	'amine-secondary',
	'aniline',
	'indole-nh',
	'azole-nh'
]);
const installRank = (need: Need) => (NITROGEN_FIRST.has(need.group) ? 0 : 1);

/** Whether need `a` goes on before need `b` where both go on at the same intermediate. */
export function installsBefore(needs: Need[], a: number, b: number): boolean {
	const ra = installRank(needs[a]!);
	const rb = installRank(needs[b]!);
	return ra !== rb ? ra < rb : a < b;
}

/** Whether a need's group is back, free, at `node` because its mask came off early at `removeAt`. */
export function freedEarlyAt(need: Need, removeAt: string, node: string): boolean {
	const here = need.path.indexOf(node);
	return here > need.path.indexOf(removeAt) && here <= need.path.indexOf(need.freeAt);
}

/**
 * What an install or removal at intermediate `node` would attack among the free groups and the
 * route's own PGs then present. An install recipe converts every free group it takes unless it
 * takes this need's group first ("would also put TBS on the free secondary alcohol"), and cannot
 * work beside a group it takes before this one ("takes the free aldehyde first"); a group the PG
 * draws but the recipe does not take is left alone (TBSCl and a tertiary alcohol).
 */
export function harm(
	rules: CheckRules,
	tree: RouteTree,
	needs: Need[],
	index: number,
	node: string,
	phase: 'install' | 'removal',
	recipe: Recipe,
	pg: string,
	drawn: readonly string[]
) {
	const structure = tree.byId.get(node)!.structure;
	const conds = recipeConditions(rules, recipe);
	const need = needs[index]!;
	const takes = phase === 'install' ? recipe.takes : [];
	// Units are told apart by their whole atom sets: neighbouring groups share atoms (an amino
	// alcohol's CH2 belongs to both), so one shared atom does not make a unit this need's own.
	const setKey = (atoms: readonly number[]) => [...atoms].sort((a, b) => a - b).join(',');
	const own = setKey(need.atomsAt.get(node) ?? []);
	// Free units masked by another need at that moment are not exposed (their PG is judged jointly).
	const masked = new Set<string>();
	needs.forEach((other, j) => {
		// A need the recipe also takes that goes on at the same place may share this install step
		// or go on first; the search only lets it stay free if neither (see `conflict` in search.ts).
		const coInstall =
			phase === 'install' &&
			other.installAt === node &&
			other.members.some((g) => takes.includes(g));
		const atoms = other.atomsAt.get(node);
		if (atoms && j !== index && (coInstall || maskedAt(needs, j, node, index, phase))) {
			masked.add(setKey(atoms));
		}
	});
	const ownAtoms = need.atomsAt.get(node) ?? [];
	let cautions = 0;
	for (const unit of freeUnits(structure)) {
		if (setKey(unit.atoms) === own || masked.has(setKey(unit.atoms))) {
			continue;
		}
		const members = otherMembers(unit, need.group, ownAtoms);
		const taken = members.filter((g) => takes.includes(g));
		if (taken.length) {
			for (const group of taken) {
				const first = prefersOver(recipe, group, need.group);
				if (first) {
					return {
						blocked: `would take the free ${rules.groupLabel(group)} before the ${rules.groupLabel(need.group)} (${first.reason.replace(/\.$/, '')})`,
						cautions
					};
				}
				if (!prefersOver(recipe, need.group, group)) {
					return {
						blocked: `would also put ${pg} on the free ${rules.groupLabel(group)}`,
						cautions
					};
				}
			}
			cautions++; // taken selectively: the slower group is worth watching (the check says so too)
			continue;
		}
		if (phase === 'install' && members.every((g) => drawn.includes(g))) {
			continue;
		}
		for (const c of conds) {
			for (const member of members) {
				const rule = rules.reactivity(member, c.id, c.reagents);
				if (rule?.rating === 'reacts') {
					const why = rule.layer === 'override' ? teamRule(rule.reason) : rule.reason;
					return {
						blocked: `would also attack the free ${rules.groupLabel(member)} (${why.replace(/\.$/, '')})`,
						cautions
					};
				}
				if (rule) {
					cautions++;
				}
			}
		}
	}
	for (const found of perceiveText(structure).protectingGroups) {
		for (const c of conds) {
			const answer = rules.stability(found.id, c.id, c.reagents, siteOfGroup(found.masks));
			if (answer.rating === 'labile') {
				const by =
					answer.layer === 'override' && answer.reason
						? ` (${teamRule(answer.reason).slice(0, -1)})`
						: '';
				return { blocked: `would also strip the route's own ${found.id} group${by}`, cautions };
			}
			if (answer.rating === 'caution') {
				cautions++;
			}
		}
	}
	return { blocked: '', cautions };
}

/**
 * The members of a free unit other than this need's own group. A diol unit also lists its two
 * alcohols; when one of them is this need (the primary OH of a 1,2-diol masked on its own), only
 * the other OH is a neighbour the recipe may also take (TBDPSCl: the secondary OH, taken later),
 * and the diol itself is no longer one once this OH is masked.
 */
function otherMembers(
	unit: { atoms: readonly number[]; members: readonly string[] },
	group: string,
	ownAtoms: readonly number[]
): string[] {
	const members = [...unit.members];
	const inside = ownAtoms.length > 0 && ownAtoms.every((a) => unit.atoms.includes(a));
	const at = inside ? members.indexOf(group) : -1;
	if (at < 0) {
		return members;
	}
	members.splice(at, 1);
	return members.filter((g) => !g.startsWith('diol-'));
}

// Reading a recipe's text is the same for every need and every point: read it once per rule view.
const readRecipes = new WeakMap<CheckRules, Map<string, ReturnType<typeof stepConditions>>>();
export function recipeConditions(
	rules: CheckRules,
	recipe: Pick<Recipe, 'reagents' | 'conditions'>
) {
	// The search asks per option pair: remember the answer on the recipe object itself first.
	const known = byObject.get(recipe);
	if (known && known.rules === rules) {
		return known.conditions;
	}
	let read = readRecipes.get(rules);
	if (!read) {
		readRecipes.set(rules, (read = new Map()));
	}
	const key = `${recipe.reagents}\u0001${recipe.conditions.join('+')}`;
	let conditions = read.get(key);
	if (!conditions) {
		read.set(key, (conditions = stepConditions(rules, recipe.reagents, recipe.conditions)));
	}
	byObject.set(recipe, { rules, conditions });
	return conditions;
}
const byObject = new WeakMap<
	object,
	{ rules: CheckRules; conditions: ReturnType<typeof stepConditions> }
>();
