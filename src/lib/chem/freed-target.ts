// The molecule perception imagines with a protecting group removed (deprotect.ts), ready for
// searching. Copying the molecule in openchemlib, deleting atoms and perceiving rings and
// aromaticity again cost ~60 µs a PG; deriving the atom table from the parent's costs ~3 µs.
// The derivation is used only where it must agree with openchemlib's: no odd atom (a charge, a
// radical, deuterium: AtomTable.odd) removed or touched by the removal, no aromatic bond cut, and
// every atom that gets hydrogens back at its usual valence. Where a ring is cut open (an acetonide
// leaving its diol), the smallest rings that `r<n>` reads are found again, up to openchemlib's
// small-ring limit of 7; an atom left only in a larger ring goes to openchemlib.
// tests/unit/chem-freed-target.test.ts compares both over every PG match of the reference set.

import { searchTarget, type SearchTarget } from './match';
import { AROMATIC, DOUBLE, SINGLE, TRIPLE } from './smarts-query';
import { withoutProtectingGroup, type Restore } from './deprotect';
import type { AtomTable } from './prefilter';
import type { Molecule } from 'openchemlib';

/** Valences at which openchemlib fills free valence with exactly the hydrogens a bond leaves. */
const USUAL_VALENCE: Record<number, number> = { 6: 4, 7: 3, 8: 2, 16: 2 };

/**
 * The target with `leaving` removed: masked atoms (and any other atom bonded to a leaving one)
 * get hydrogens back, or for `carbonyl` the first masked atom its =O. `atomMap[old]` is the new
 * index (-1 removed), e.g. `freedTarget(target, [5, 6], [4], 'hydrogen')`.
 */
export function freedTarget(
	parent: SearchTarget,
	leaving: readonly number[],
	masked: readonly number[],
	restore: Restore
): { target: SearchTarget; atomMap: number[] } {
	const derived = !parent.exhaustive ? derivedTable(parent.table, leaving, masked, restore) : null;
	if (!derived) {
		const freed = withoutProtectingGroup(parent.molecule, [...leaving], [...masked], restore);
		return {
			target: searchTarget(freed.molecule, { exhaustive: parent.exhaustive }),
			atomMap: freed.atomMap
		};
	}
	const { table, atomMap } = derived;
	let molecule: Molecule | null = null;
	let search: SearchTarget | null = null;
	// openchemlib's copy is made only if a pattern it alone can read is searched.
	const fallback = () =>
		(search ??= searchTarget(
			(molecule ??= withoutProtectingGroup(
				parent.molecule,
				[...leaving],
				[...masked],
				restore
			).molecule)
		));
	const target: SearchTarget = {
		get molecule() {
			return fallback().molecule;
		},
		get searcher() {
			return fallback().searcher;
		},
		table,
		features: tableFeatures(table, parent.features),
		exhaustive: false
	};
	return { target, atomMap };
}

function bondOrder(bits: number): number {
	return bits & TRIPLE ? 3 : bits & DOUBLE ? 2 : bits & SINGLE ? 1 : 0;
}

/** The parent's table without `leaving`, or null where openchemlib's answer could differ. */
export function derivedTable(
	parent: AtomTable,
	leaving: readonly number[],
	masked: readonly number[],
	restore: Restore
): { table: AtomTable; atomMap: number[] } | null {
	const count = parent.element.length;
	const gone = new Uint8Array(count);
	for (const atom of leaving) {
		if (parent.odd[atom]) {
			return null;
		}
		gone[atom] = 1;
	}
	const atomMap = new Array<number>(count);
	let kept = 0;
	for (let atom = 0; atom < count; atom++) {
		atomMap[atom] = gone[atom] ? -1 : kept++;
	}
	const carbonyl = restore === 'carbonyl' ? masked[0]! : -1;
	let ringCut = false;
	const size = kept + (carbonyl >= 0 ? 1 : 0);
	const table: AtomTable = {
		element: new Int16Array(size),
		aromatic: new Uint8Array(size),
		hydrogens: new Int16Array(size),
		charge: new Int8Array(size),
		ringSize: new Int16Array(size),
		neighbours: [],
		bonds: [],
		odd: new Uint8Array(size),
		plain: true
	};
	for (let atom = 0; atom < count; atom++) {
		if (gone[atom]) {
			continue;
		}
		const to = atomMap[atom]!;
		const neighbours: number[] = [];
		const bonds: number[] = [];
		let lost = 0;
		let valence = parent.hydrogens[atom]!;
		parent.neighbours[atom]!.forEach((other, i) => {
			const bits = parent.bonds[atom]![i]!;
			valence += bondOrder(bits);
			if (!gone[other]) {
				neighbours.push(atomMap[other]!);
				bonds.push(bits);
			} else if (bits & AROMATIC) {
				lost = -Infinity;
			} // a ring cut open: aromaticity may change
			else {
				lost += bondOrder(bits);
				if (parent.ringSize[atom]! > 0 && parent.ringSize[other]! > 0) {
					ringCut = true;
				}
			}
		});
		if (lost < 0 || (lost > 0 && parent.odd[atom])) {
			return null;
		}
		let hydrogens = parent.hydrogens[atom]!;
		if (lost > 0) {
			if (USUAL_VALENCE[parent.element[atom]!] !== valence) {
				return null;
			}
			if (atom === carbonyl) {
				if (lost !== 2) {
					return null;
				}
				neighbours.push(size - 1);
				bonds.push(DOUBLE);
			} else {
				hydrogens += lost;
			}
		}
		table.element[to] = parent.element[atom]!;
		table.aromatic[to] = parent.aromatic[atom]!;
		table.hydrogens[to] = hydrogens;
		table.charge[to] = parent.charge[atom]!;
		table.ringSize[to] = parent.ringSize[atom]!;
		table.odd[to] = parent.odd[atom]!;
		table.neighbours.push(neighbours);
		table.bonds.push(bonds);
	}
	table.plain = !table.odd.includes(1);
	if (carbonyl >= 0) {
		if (gone[carbonyl]) {
			return null;
		}
		table.element[size - 1] = 8;
		table.neighbours.push([atomMap[carbonyl]!]);
		table.bonds.push([DOUBLE]);
	}
	if (ringCut) {
		for (let atom = 0; atom < size; atom++) {
			if (table.ringSize[atom] === 0) {
				continue;
			}
			const ring = smallestRing(table, atom);
			if (ring > MAX_SMALL_RING) {
				return null;
			}
			table.ringSize[atom] = ring;
		}
	}
	return { table, atomMap };
}

/** openchemlib's RingCollection lists every ring up to this size; larger ones it sizes its own way. */
const MAX_SMALL_RING = 7;

/**
 * The size of the smallest ring through `start`, 0 in none: breadth first from it, each atom
 * tagged with the neighbour of `start` it was reached through; a bond between two atoms reached
 * through different neighbours closes a ring of their distances plus one.
 */
function smallestRing(table: AtomTable, start: number): number {
	const distance = new Int32Array(table.element.length).fill(-1);
	const branch = new Int32Array(table.element.length).fill(-1);
	distance[start] = 0;
	const queue = [start];
	let smallest = Infinity;
	for (let head = 0; head < queue.length; head++) {
		const atom = queue[head]!;
		if (2 * distance[atom]! + 1 >= smallest) {
			break;
		}
		for (const other of table.neighbours[atom]!) {
			if (distance[other] === -1) {
				distance[other] = distance[atom]! + 1;
				branch[other] = atom === start ? other : branch[atom]!;
				queue.push(other);
			} else if (other !== start && atom !== start && branch[other] !== branch[atom]) {
				smallest = Math.min(smallest, distance[atom]! + distance[other]! + 1);
			}
		}
	}
	return smallest === Infinity ? 0 : smallest;
}

/**
 * The features match.ts pre-checks, read from a table. A 3-ring cannot appear by removing atoms,
 * so the parent's 'ring-3' is kept (a feature too many only costs a search, never a match).
 */
function tableFeatures(
	table: AtomTable,
	parentFeatures: ReadonlySet<string | number>
): Set<string | number> {
	const features = new Set<string | number>();
	if (parentFeatures.has('ring-3')) {
		features.add('ring-3');
	}
	for (let atom = 0; atom < table.element.length; atom++) {
		const element = table.element[atom]!;
		features.add(element);
		if (table.hydrogens[atom]! > 0) {
			if (element === 8) {
				features.add('O-H');
			} else if (element === 7) {
				features.add('N-H');
			} else if (element === 16) {
				features.add('S-H');
			}
		}
		table.neighbours[atom]!.forEach((other, i) => {
			const bits = table.bonds[atom]![i]!;
			if (bits & TRIPLE) {
				features.add('triple');
			}
			if (!(bits & DOUBLE) || bits & AROMATIC) {
				return;
			}
			const pair = element * 100 + table.element[other]!;
			if (pair === 608 || pair === 806) {
				features.add('C=O');
			} else if (pair === 606) {
				features.add('C=C');
			} else if (pair === 607 || pair === 706) {
				features.add('C=N');
			}
		});
	}
	return features;
}
