// A step's atom map read off its two SMILES, where they are written alike: a chemist writes a
// product by editing the substrate's SMILES, so the text before and after the edit is the same and
// its atoms are the same atoms. Checked (same elements, same bonds among the atoms paired), this
// is a common substructure found in microseconds where the maximum common substructure (MCS)
// takes ~40 ms for 50 atoms, most of first sight of a long route. The caller says which atoms it
// needs mapped; when the shared text misses any of them, it searches the MCS as before.

import { Molecule } from 'openchemlib';
import type { AtomMap } from './atom-map';
import { detectFormat } from './format';
import { writtenGraph, type WrittenAtom } from './smiles-graph';

/**
 * Pairs the atoms of the common start and end of two SMILES, e.g. `O=CCC(C)=O` → `CC(O)CC(C)=O`:
 * the `CC(C)=O` written at the end of both. Null when a SMILES is not one, the pairing is not a
 * common substructure of the two molecules, or it leaves any of `needed` (substrate atoms) out.
 * `substrate` and `product` are the texts as openchemlib read them (atom i = i-th atom written).
 */
export function mapAtomsByText(
	substrateText: string,
	productText: string,
	substrate: Molecule,
	product: Molecule,
	needed: readonly number[]
): AtomMap | null {
	if (detectFormat(substrateText) !== 'smiles' || detectFormat(productText) !== 'smiles') {
		return null;
	}
	const [a, b] = [substrateText, productText].map((t) => t.trim().split(/\s+/)[0]!) as [
		string,
		string
	];
	let atomsA: WrittenAtom[];
	let atomsB: WrittenAtom[];
	try {
		atomsA = writtenGraph(a).atoms;
		atomsB = writtenGraph(b).atoms;
	} catch {
		return null;
	}
	if (atomsA.length !== substrate.getAllAtoms() || atomsB.length !== product.getAllAtoms()) {
		return null;
	}
	let head = 0;
	while (head < a.length && head < b.length && a[head] === b[head]) {
		head++;
	}
	let tail = 0;
	const room = Math.min(a.length, b.length) - head;
	while (tail < room && a[a.length - 1 - tail] === b[b.length - 1 - tail]) {
		tail++;
	}
	const map: AtomMap = new Map();
	for (let i = 0; i < Math.min(atomsA.length, atomsB.length); i++) {
		const [x, y] = [atomsA[i]!, atomsB[i]!];
		if (x.start + x.text.length > head || y.start + y.text.length > head) {
			break;
		}
		map.set(i, i);
	}
	for (let k = 1; k <= Math.min(atomsA.length, atomsB.length); k++) {
		const [i, j] = [atomsA.length - k, atomsB.length - k];
		const [x, y] = [atomsA[i]!, atomsB[j]!];
		if (x.start < a.length - tail || y.start < b.length - tail || x.text !== y.text) {
			break;
		}
		map.set(i, j);
	}
	// Where the edit touches the shared text (`C(=O)C` → `C(O)C` shares the `O`), pairs whose
	// bonds disagree are dropped, until the rest is a common substructure.
	for (let misfits = misfitsOf(substrate, product, map); misfits.size;) {
		for (const atom of misfits) {
			map.delete(atom);
		}
		misfits = misfitsOf(substrate, product, map);
	}
	return needed.every((atom) => map.has(atom)) ? map : null;
}

/** Paired substrate atoms with another element, or on a bond among paired atoms that the other side lacks or orders otherwise. */
function misfitsOf(substrate: Molecule, product: Molecule, map: AtomMap): Set<number> {
	const misfits = new Set<number>();
	for (const [x, y] of map) {
		if (substrate.getAtomicNo(x) !== product.getAtomicNo(y)) {
			misfits.add(x);
		}
	}
	const bondsAmong = (molecule: Molecule, keep: (atom: number) => number | undefined) => {
		molecule.ensureHelperArrays(Molecule.cHelperRings);
		const bonds = new Map<string, { ends: [number, number]; order: number | 'aromatic' }>();
		for (let bond = 0; bond < molecule.getAllBonds(); bond++) {
			const [u, v] = [keep(molecule.getBondAtom(0, bond)), keep(molecule.getBondAtom(1, bond))];
			if (u === undefined || v === undefined) {
				continue;
			}
			// Two writings of one ring may get different Kekulé bonds: aromatic is aromatic.
			const order = molecule.isAromaticBond(bond) ? 'aromatic' : molecule.getBondOrder(bond);
			bonds.set(u < v ? `${u}-${v}` : `${v}-${u}`, { ends: [u, v], order });
		}
		return bonds;
	};
	const back = new Map([...map].map(([x, y]) => [y, x]));
	// Both sides in substrate numbering.
	const inSubstrate = bondsAmong(substrate, (atom) => (map.has(atom) ? atom : undefined));
	const inProduct = bondsAmong(product, (atom) => back.get(atom));
	const pairs: [typeof inSubstrate, typeof inProduct][] = [
		[inSubstrate, inProduct],
		[inProduct, inSubstrate]
	];
	for (const [one, other] of pairs) {
		for (const [key, bond] of one) {
			if (other.get(key)?.order !== bond.order) {
				bond.ends.forEach((atom) => misfits.add(atom));
			}
		}
	}
	return misfits;
}
