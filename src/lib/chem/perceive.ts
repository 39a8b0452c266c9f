// Perception: which free groups a molecule carries and which protecting groups are installed,
// atom by atom. Pure functions of the molecule and the rule table (patterns.ts).

import type { Molecule } from 'openchemlib';
import { findMatches, hasFeatures, matchedAtoms, searchTarget, type SearchTarget } from './match';
import { perceptionRules, type CompiledProtectingGroup, type PerceptionRules } from './patterns';
import { freedTarget } from './freed-target';

export type GroupInstance = {
	id: string;
	/** All matched atoms, sorted: one instance per distinct atom set. */
	atoms: number[];
	/** The atom the group is "at" (the carbonyl carbon, the hydroxyl oxygen, …). */
	key: number;
};

export type ProtectingGroupInstance = {
	id: string;
	/** The PG's own atoms plus the masked atoms it sits on, sorted. */
	atoms: number[];
	/** Id of the free group that removal would give back. */
	masks: string;
	/** The key atom of that free group (e.g. the oxygen of a TBS ether). */
	maskedAtom: number;
	/** Every atom of the free group the PG sits on (both oxygens of an acetonide). */
	maskedAtoms: number[];
};

export type Perception = { groups: GroupInstance[]; protectingGroups: ProtectingGroupInstance[] };

/** Every instance of the named groups (all groups when `ids` is omitted), e.g. `findGroups(mol)` on ethanol → `[{ id: 'alcohol-primary', atoms: [0, 1, 2], key: 2 }]`. */
export function findGroups(
	molecule: Molecule | SearchTarget,
	ids?: readonly string[],
	rules = perceptionRules()
): GroupInstance[] {
	const target = 'searcher' in molecule ? molecule : searchTarget(molecule);
	const groups = ids ? ids.map((id) => rules.groupsById.get(id)!).filter(Boolean) : rules.groups;
	const found: GroupInstance[] = [];
	for (const group of groups) {
		if (!hasFeatures(target, group.needs)) {
			continue;
		}
		const seen = new Set<string>();
		for (const match of findMatches(target, group.compiled)) {
			const atoms = matchedAtoms(match);
			const signature = atoms.join(',');
			if (seen.has(signature)) {
				continue;
			}
			seen.add(signature);
			found.push({ id: group.id, atoms, key: match[group.compiled.key]! });
		}
	}
	// Later searches on this molecule (protecting groups) may need to know which groups it has.
	if (!ids) {
		for (const group of found) {
			target.features.add(group.id);
		}
	}
	return found;
}

type Candidate = {
	pg: CompiledProtectingGroup;
	covered: number[];
	leaving: Set<number>;
	masked: number[];
};

/** The installed protecting groups, one per set of atoms, e.g. `findProtectingGroups(mol)` on a TBS ether → `[{ id: 'TBS', masks: 'alcohol-primary', … }]`. */
export function findProtectingGroups(
	molecule: Molecule | SearchTarget,
	rules = perceptionRules(),
	perceivedGroups?: readonly GroupInstance[]
): ProtectingGroupInstance[] {
	const target = 'searcher' in molecule ? molecule : searchTarget(molecule);
	// PG rows may need a group (a TBS ether needs a silyl ether): know which groups are there.
	const groups = perceivedGroups ?? findGroups(target, undefined, rules);
	for (const group of groups) {
		target.features.add(group.id);
	}
	const candidates: Candidate[] = [];
	rules.protectingGroups.forEach((pg) => {
		if (!hasFeatures(target, pg.needs)) {
			return;
		}
		for (const pattern of pg.compiled) {
			for (const match of findMatches(target, pattern)) {
				const context = new Set(pattern.context.map((i) => match[i]!));
				const masked = pattern.masked.map((i) => match[i]!);
				const covered = matchedAtoms(match).filter((atom) => !context.has(atom));
				const leaving = new Set(covered.filter((atom) => !masked.includes(atom)));
				candidates.push({ pg, covered, leaving, masked });
			}
		}
	});
	// More specific first: higher priority, then the larger match, then table order (stable sort).
	candidates.sort((a, b) => b.pg.priority - a.pg.priority || b.covered.length - a.covered.length);
	const accepted: (Candidate & { masks: string })[] = [];
	for (const candidate of candidates) {
		if (accepted.some((taken) => overlaps(taken, candidate))) {
			continue;
		}
		const masks = maskedGroup(target, candidate, rules);
		if (masks) {
			accepted.push({ ...candidate, masks });
		}
	}
	return accepted
		.map(({ pg, covered, masked, masks }) => ({
			id: pg.id,
			atoms: covered,
			masks,
			maskedAtom: masked[0]!,
			maskedAtoms: masked
		}))
		.sort((a, b) => a.atoms[0]! - b.atoms[0]! || a.id.localeCompare(b.id));
}

/**
 * Two PG matches overlap when they share an atom that at least one of them would remove. Sharing
 * only masked atoms is fine: two Boc groups on one nitrogen are two PGs.
 */
function overlaps(a: Candidate, b: Candidate): boolean {
	return b.covered.some(
		(atom) => a.covered.includes(atom) && (a.leaving.has(atom) || b.leaving.has(atom))
	);
}

/**
 * What the PG stands in for: imagine it removed (deprotect.ts) and look for one of the groups it
 * protects on the masked atoms. A match that gives back none of them is not this PG (a "benzyl
 * ether" whose removal frees a carboxylic acid is a benzyl ester), unless a fallback is declared.
 */
function maskedGroup(
	target: SearchTarget,
	candidate: Candidate,
	rules: PerceptionRules
): string | null {
	const { target: freed, atomMap } = freedTarget(
		target,
		[...candidate.leaving],
		candidate.masked,
		candidate.pg.restore
	);
	const maskedNow = candidate.masked.map((atom) => atomMap[atom]!);
	const groups = findGroups(freed, candidate.pg.protects, rules);
	for (const id of candidate.pg.protects) {
		if (groups.some((g) => g.id === id && maskedNow.every((atom) => g.atoms.includes(atom)))) {
			return id;
		}
	}
	return candidate.pg.fallbackMasks ?? null;
}

/** Groups and protecting groups together (`exhaustive` skips the pre-checks, for tests), e.g. `perceive(Molecule.fromSmiles('CC(C)(C)OC(=O)NCCO'))`. */
export function perceive(
	molecule: Molecule,
	rules = perceptionRules(),
	options: { exhaustive?: boolean } = {}
): Perception {
	const target = searchTarget(molecule, options);
	const groups = findGroups(target, undefined, rules);
	return { groups, protectingGroups: findProtectingGroups(target, rules, groups) };
}
