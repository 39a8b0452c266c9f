// Which substrate atom becomes which product atom, through the maximum common substructure
// (MCS) of each substrate fragment with the product. The clash check uses it to tell the
// groups a step works on (they change) from the ones that stand by (they survive unchanged).

import { MCS, Molecule, SSSearcher } from 'openchemlib';

export type AtomMap = Map<number, number>;

/**
 * Maps substrate atom indices to product atom indices, e.g. for `CC(=O)CCC(=O)OC` →
 * `CC(=O)CCC(C)(C)O` the ketone's atoms map onto the product's ketone. Atoms without a
 * counterpart are absent; null when no fragment shares any structure with the product.
 */
export function mapAtoms(substrate: Molecule, product: Molecule): AtomMap | null {
	substrate.ensureHelperArrays(Molecule.cHelperRings);
	product.ensureHelperArrays(Molecule.cHelperRings);
	const map: AtomMap = new Map();
	const taken = new Set<number>();
	for (const { piece, toSubstrate } of fragmentsOf(substrate)) {
		const common = commonStructure(piece, product);
		if (!common) {
			continue;
		}
		const inPiece = matches(common, piece, 'firstMatch')[0];
		const inProduct = matches(common, product, 'overlapping').find((m) =>
			m.every((a) => a < 0 || !taken.has(a))
		);
		if (!inPiece || !inProduct) {
			continue;
		}
		inPiece.forEach((pieceAtom, i) => {
			const productAtom = inProduct[i]!;
			if (pieceAtom < 0 || productAtom < 0) {
				return;
			}
			map.set(toSubstrate[pieceAtom]!, productAtom);
			taken.add(productAtom);
		});
	}
	return map.size > 0 ? map : null;
}

/** Each disconnected part of a molecule (a convergent step's substrates) with its atom map back. */
function fragmentsOf(molecule: Molecule): { piece: Molecule; toSubstrate: number[] }[] {
	const atoms = molecule.getAllAtoms();
	const fragmentNo = new Array<number>(atoms).fill(0);
	const count = molecule.getFragmentNumbers(fragmentNo, false, false);
	if (count <= 1) {
		return [{ piece: molecule, toSubstrate: Array.from({ length: atoms }, (_, i) => i) }];
	}
	return Array.from({ length: count }, (_, f) => {
		const piece = new Molecule(0, 0);
		const atomMap = new Array<number>(atoms).fill(-1);
		molecule.copyMoleculeByAtoms(
			piece,
			fragmentNo.map((n) => n === f),
			true,
			atomMap
		);
		const toSubstrate: number[] = [];
		atomMap.forEach((pieceAtom, atom) => {
			if (pieceAtom >= 0) {
				toSubstrate[pieceAtom] = atom;
			}
		});
		piece.ensureHelperArrays(Molecule.cHelperRings);
		return { piece, toSubstrate };
	});
}

function commonStructure(a: Molecule, b: Molecule): Molecule | null {
	const mcs = new MCS();
	// MCS wants the molecule with more bonds first.
	if (a.getAllBonds() >= b.getAllBonds()) {
		mcs.set(a, b);
	} else {
		mcs.set(b, a);
	}
	const common = mcs.getMCS();
	if (!common || common.getAllAtoms() === 0) {
		return null;
	}
	common.setFragment(true);
	return common;
}

function matches(
	fragment: Molecule,
	target: Molecule,
	countMode: 'firstMatch' | 'overlapping'
): number[][] {
	const searcher = new SSSearcher();
	searcher.setMol(fragment, target);
	if (searcher.findFragmentInMolecule({ countMode }) === 0) {
		return [];
	}
	return searcher.getMatchList();
}
