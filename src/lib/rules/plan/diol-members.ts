// A diol is masked as one unit, but a step may make one from a lone alcohol (a Grignard addition
// next to a CH2OH) or use up one of its two OH groups (a Swern oxidation of the secondary OH of a
// 1,2-diol). The alcohol that stands by such a step is still a group the step can attack: these
// pairings let its track run through the step instead of ending where the unit changes shape.

import { mapAtoms, type AtomMap } from '../../chem/atom-map';
import { sharedMolecule } from '../../chem/molecule-cache';
import { mapAtomsByText } from '../../chem/text-atom-map';
import { combinedMolecule } from '../check/transformation';
import type { Unit } from './track';

const isDiol = (unit: Unit) => unit.id.startsWith('diol-');
const isAlcohol = (unit: Unit) => unit.id.startsWith('alcohol-');
const inside = (atoms: readonly number[], outer: readonly number[]) =>
	atoms.every((a) => outer.includes(a));

/**
 * `into`: a substrate alcohol (by index) whose atoms end up inside a product diol, with its atoms
 * there. `outOf`: a product alcohol (by index) that was one OH of a substrate diol, with its atoms
 * in the substrate (numbered as in `combinedMolecule`). Only units the count-based pairing left
 * unpaired are considered; empty when there are none (and then no atom map is made).
 */
export function diolMemberPairs(
	before: Unit[],
	after: Unit[],
	paired: (number | undefined)[],
	substrates: string[],
	product: string
): { into: { before: number; atoms: number[] }[]; outOf: { after: number; atoms: number[] }[] } {
	const taken = new Set(paired.filter((p) => p !== undefined));
	const loneBefore = before.flatMap((u, i) => (paired[i] === undefined ? [i] : []));
	const loneAfter = after.flatMap((_, j) => (taken.has(j) ? [] : [j]));
	const intoCandidates = loneBefore
		.filter((i) => isAlcohol(before[i]!))
		.filter(() => loneAfter.some((j) => isDiol(after[j]!)));
	const outCandidates = loneAfter
		.filter((j) => isAlcohol(after[j]!))
		.filter(() => loneBefore.some((i) => isDiol(before[i]!)));
	if (intoCandidates.length === 0 && outCandidates.length === 0) {
		return { into: [], outOf: [] };
	}
	const map = stepMap(
		substrates,
		product,
		[...intoCandidates, ...loneBefore.filter((i) => isDiol(before[i]!))].flatMap(
			(i) => before[i]!.atoms
		)
	);
	if (!map) {
		return { into: [], outOf: [] };
	}
	const into = intoCandidates.flatMap((i) => {
		const atoms = before[i]!.atoms.map((a) => map.get(a));
		if (atoms.some((a) => a === undefined)) {
			return [];
		}
		const diol = loneAfter.find(
			(j) => isDiol(after[j]!) && inside(atoms as number[], after[j]!.atoms)
		);
		return diol === undefined ? [] : [{ before: i, atoms: atoms as number[] }];
	});
	const back = new Map([...map.entries()].map(([from, to]) => [to, from]));
	const outOf = outCandidates.flatMap((j) => {
		const atoms = after[j]!.atoms.map((a) => back.get(a));
		if (atoms.some((a) => a === undefined)) {
			return [];
		}
		const diol = loneBefore.find(
			(i) => isDiol(before[i]!) && inside(atoms as number[], before[i]!.atoms)
		);
		return diol === undefined ? [] : [{ after: j, atoms: atoms as number[] }];
	});
	return { into, outOf };
}

/** Substrate atom → product atom: through the text both SMILES share where it covers `needed`, else the MCS. */
function stepMap(substrates: string[], product: string, needed: number[]): AtomMap | null {
	const substrate =
		substrates.length === 1 ? sharedMolecule(substrates[0]!) : combinedMolecule(substrates);
	const byText =
		substrates.length === 1
			? mapAtomsByText(substrates[0]!, product, substrate, sharedMolecule(product), needed)
			: null;
	return byText ?? mapAtoms(substrate, sharedMolecule(product));
}
