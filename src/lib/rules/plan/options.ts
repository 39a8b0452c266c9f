// Which protecting groups could mask one need, judged one by one: survives every step it must
// sit through, goes on without attacking what else is free, comes off without harming what stays.

import { perceptionRules } from '../../chem/patterns';
import { readStructure } from '../../chem/parse';
import { perceiveText } from '../../chem/perception-cache';
import { stereocentres } from '../../chem/properties';
import { siteOfGroup } from '../check/pg-site';
import type { CheckRules } from '../check/types';
import type { RuleTable } from '../table';
import { stepConditions, type RouteTree } from './tree';
import { freeUnits } from './track';
import type { Need, Option } from './types';

// How hard a condition class is on a molecule, for ranking only (why: a chemist prefers the
// milder of two otherwise equal plans). Unlisted classes count 1.
const HARSHNESS: Record<string, number> = {
	'acid-strong': 3, 'base-strong': 3, 'hydride-strong': 3, organometallic: 3, 'dissolving-metal': 3, 'oxidant-strong': 3,
	'lewis-acid': 2, 'base-aqueous': 2, heat: 2, 'oxidant-electron-transfer': 2
};
/** Summed harshness of condition classes, e.g. `harshnessOf(['acid-strong', 'fluoride'])` → 4. */
export const harshnessOf = (conditions: string[]) => conditions.reduce((sum, id) => sum + (HARSHNESS[id] ?? 1), 0);

export type Judged = { pg: string; options: Option[]; rejected: string | null; killedAt?: string };

/**
 * Whether need `other` is masked at intermediate `node` while need `index` is worked on there,
 * its mask coming off at `removeAt` (by default where it must be free again). At an intermediate
 * the installs run first (in need order) and the removals after, so a group that must come off
 * here can still shield its neighbour while the neighbour's PG goes on. E.g. a Boc amine freed
 * before step 3 is still masked while Fmoc goes on the other amine there. A need on another
 * branch of a convergent route is not in that intermediate at all.
 */
export function maskedAt(needs: Need[], other: number, node: string, index: number, phase: 'install' | 'removal', removeAt = needs[other]!.freeAt): boolean {
	const y = needs[other]!;
	const here = y.path.indexOf(node);
	if (here < 0) return false;
	const on = y.path.indexOf(y.installAt);
	const off = y.path.indexOf(removeAt);
	if (phase === 'removal') return on <= here && here <= off;
	return (on < here || (on === here && other < index)) && here <= off;
}

/** Whether a need's group is back, free, at `node` because its mask came off early at `removeAt`. */
export function freedEarlyAt(need: Need, removeAt: string, node: string): boolean {
	const here = need.path.indexOf(node);
	return here > need.path.indexOf(removeAt) && here <= need.path.indexOf(need.freeAt);
}

/**
 * Where a PG on `need` may come off, latest first, with the cautions it collects on the way: from
 * where it must be free again back to the product of the last step that attacks the group, as far
 * as the PG survives the steps in between. Empty, with the step that removes it, when it cannot
 * even reach the end of the last attack.
 */
function removalPoints(rules: CheckRules, tree: RouteTree, need: Need, pg: string): { points: { node: string; cautions: number }[]; killer?: { step: string; condition: string } } {
	const on = need.path.indexOf(need.installAt);
	const earliest = need.path.indexOf(need.removableFrom);
	const latest = need.path.indexOf(need.freeAt);
	const points: { node: string; cautions: number }[] = [];
	let cautions = 0;
	for (let at = on; at <= latest; at++) {
		if (at >= earliest) points.unshift({ node: need.path[at]!, cautions });
		if (at === latest) break;
		const step = tree.next.get(need.path[at]!)!;
		for (const c of tree.conditions.get(step.id)!) {
			const rating = rules.stability(pg, c.id, c.explicit ? [] : c.reagents, siteOfGroup(need.group)).rating;
			if (rating === 'labile') return points.length ? { points } : { points, killer: { step: step.id, condition: c.id } };
			if (rating === 'caution') cautions++;
		}
	}
	return { points };
}

/** Every candidate PG for `needs[index]` with its admissible options or why it fails, e.g. Bn for an alcohol → "Bn rejected: … hydrogenation …". */
export function judgeCandidates(table: RuleTable, rules: CheckRules, tree: RouteTree, needs: Need[], index: number): Judged[] {
	const need = needs[index]!;
	const protects = new Map(perceptionRules().protectingGroups.map((pg) => [pg.id, pg.protects]));
	const rows = table.protectingGroups.filter((row) => protects.get(row.id)?.includes(need.group));
	return rows.map((row): Judged => {
		const transform = row.install.transforms.find((t) => (t.groups as readonly string[]).includes(need.group))?.smarts;
		if (!transform) return { pg: row.id, options: [], rejected: `${row.id} rejected: the rule table has no install transform to draw it on a ${rules.groupLabel(need.group)}` };
		const { points, killer } = removalPoints(rules, tree, need, row.id);
		if (killer) {
			const rejected = `${row.id} rejected: the ${rules.conditionLabel(killer.condition).toLowerCase()} conditions of ${tree.stepName(killer.step)} would remove it`;
			return { pg: row.id, options: [], rejected, killedAt: killer.step };
		}
		const method = row.install.methods[0]!;
		const installConditions = [...method.conditions];
		const install = { reagents: method.reagents[0] ?? '', conditions: installConditions };
		const installHarm = harm(rules, tree, needs, index, need.installAt, 'install', install.reagents, installConditions);
		if (installHarm.blocked) return { pg: row.id, options: [], rejected: `${row.id} rejected: installing it (${install.reagents}) ${installHarm.blocked}` };
		// A PG that makes a new stereocentre turns a chiral substrate into a mixture of diastereomers.
		const stereocentre = row.drawbacks.find((d) => d.kind === 'new-stereocentre');
		const diastereomers = stereocentre !== undefined && isChiral(tree.byId.get(need.installAt)!.structure);
		const options: Option[] = [];
		let firstRemovalProblem = '';
		for (const point of points) {
			for (const removal of row.remove) {
				const reagents = removal.reagents[0] ?? '';
				const removalHarm = harm(rules, tree, needs, index, point.node, 'removal', reagents, [...removal.conditions]);
				if (removalHarm.blocked) {
					firstRemovalProblem ||= `removing it (${reagents}) ${removalHarm.blocked}`;
					continue;
				}
				options.push({
					pg: row.id,
					transform,
					install,
					removal: { reagents, conditions: [...removal.conditions] },
					removeAt: point.node,
					cautions: point.cautions + installHarm.cautions + removalHarm.cautions + (diastereomers ? 1 : 0),
					harshness: harshnessOf(installConditions) + harshnessOf([...removal.conditions]),
					drawbacks: diastereomers ? [stereocentre] : [],
					preference: 0,
					why: diastereomers ? stereocentre.note : ''
				});
			}
		}
		if (options.length === 0) return { pg: row.id, options, rejected: `${row.id} rejected: ${firstRemovalProblem}` };
		return { pg: row.id, options, rejected: null };
	});
}

const isChiral = (structure: string) => stereocentres(readStructure(structure, { stereo: true, warnings: false }).molecule).length > 0;

/** What an install or removal at intermediate `node` would attack among the free groups and the route's own PGs then present. */
function harm(rules: CheckRules, tree: RouteTree, needs: Need[], index: number, node: string, phase: 'install' | 'removal', reagents: string, conditions: string[]) {
	const structure = tree.byId.get(node)!.structure;
	const conds = stepConditions(rules, reagents, conditions);
	const need = needs[index]!;
	// Units are told apart by their whole atom sets: neighbouring groups share atoms (an amino
	// alcohol's CH2 belongs to both), so one shared atom does not make a unit this need's own.
	const setKey = (atoms: readonly number[]) => [...atoms].sort((a, b) => a - b).join(',');
	const own = setKey(need.atomsAt.get(node) ?? []);
	// Free units masked by another need at that moment are not exposed (their PG is judged jointly).
	const masked = new Set<string>();
	needs.forEach((other, j) => {
		// A same-type neighbour that goes on at the same place may share this install step; the
		// search only lets it stay free if it does not (see `compatible` in search.ts).
		const coInstall = phase === 'install' && other.installAt === node && other.group === need.group;
		const atoms = other.atomsAt.get(node);
		if (atoms && j !== index && (coInstall || maskedAt(needs, j, node, index, phase))) masked.add(setKey(atoms));
	});
	let cautions = 0;
	for (const unit of freeUnits(structure)) {
		if (setKey(unit.atoms) === own || masked.has(setKey(unit.atoms))) continue;
		for (const c of conds) {
			for (const member of unit.members) {
				const rule = rules.reactivity(member, c.id);
				if (rule?.rating === 'reacts') return { blocked: `would also attack the free ${rules.groupLabel(member)} (${rule.reason.replace(/\.$/, '')})`, cautions };
				if (rule) cautions++;
			}
		}
	}
	for (const pg of perceiveText(structure).protectingGroups) {
		for (const c of conds) {
			const answer = rules.stability(pg.id, c.id, c.explicit ? [] : c.reagents, siteOfGroup(pg.masks));
			if (answer.rating === 'labile') return { blocked: `would also strip the route's own ${pg.id} group`, cautions };
			if (answer.rating === 'caution') cautions++;
		}
	}
	return { blocked: '', cautions };
}
