// Draws protected intermediates: the PG's own atoms (rules/pg-fragments.json) bonded to the site
// of the free group it masks. Building from the unprotected structure every time also gives the
// regenerated free group after a removal, with no bookkeeping of deleted atoms.

import { Molecule } from 'openchemlib';
import data from '../../../../rules/pg-fragments.json';
import { LruCache } from '../../chem/cache';
import { readStructure } from '../../chem/parse';

type Fragment = { site: 'heteroatom' | 'alkyne' | 'diol' | 'carbonyl'; smiles: string; attach: number[] };
const FRAGMENTS = data.fragments as Record<string, Fragment>;

export type Mask = { pg: string; atoms: number[] };

/** Whether the planner can draw a PG, e.g. `canDraw('TBS')` → true. */
export const canDraw = (pg: string) => pg in FRAGMENTS;

/** The structure with each mask drawn on, e.g. `protectedStructure('OCCC=O', [{ pg: 'TBS', atoms: [0, 1, 2] }])`. */
export function protectedStructure(structure: string, masks: Mask[]): string {
	if (masks.length === 0) return structure;
	const cacheKey = `${structure}\u0001${masks.map((m) => `${m.pg}:${m.atoms.join(',')}`).join(';')}`;
	const stored = drawn.get(cacheKey);
	if (stored) return stored;
	const smiles = draw(structure, masks);
	drawn.set(cacheKey, smiles);
	return smiles;
}

// The ranked plans share most of their protected intermediates; draw each one once.
const drawn = new LruCache<string, string>(2000);

/** Forgets drawn structures (benchmarks, tests). */
export function clearDrawCache(): void {
	drawn.clear();
}

function draw(structure: string, masks: Mask[]): string {
	const molecule = readStructure(structure).molecule.getCompactCopy();
	molecule.ensureHelperArrays(Molecule.cHelperNeighbours);
	const doomed: number[] = [];
	for (const mask of masks) {
		const fragment = FRAGMENTS[mask.pg];
		if (!fragment) throw new Error(`No drawing for protecting group "${mask.pg}" in rules/pg-fragments.json.`);
		const sites = sitesOf(molecule, mask.atoms, fragment.site);
		const offset = molecule.getAllAtoms();
		molecule.addMolecule(Molecule.fromSmiles(fragment.smiles));
		if (fragment.site === 'diol') for (const oxygen of sites.atoms) molecule.addBond(oxygen, offset + fragment.attach[0]!);
		else for (const a of fragment.attach) molecule.addBond(sites.atoms[0]!, offset + a);
		if (sites.leaving !== undefined) doomed.push(sites.leaving);
	}
	// Deleting renumbers atoms, so the carbonyl oxygens go last, all at once.
	if (doomed.length) molecule.deleteAtoms(doomed);
	return molecule.toIsomericSmiles();
}

/** The atom(s) a fragment bonds to, and for a carbonyl the oxygen it replaces. */
function sitesOf(molecule: Molecule, atoms: number[], site: Fragment['site']): { atoms: number[]; leaving?: number } {
	const withH = (a: number) => molecule.getAllHydrogens(a) > 0;
	if (site === 'heteroatom') {
		const hetero = atoms.find((a) => [7, 8, 16].includes(molecule.getAtomicNo(a)) && withH(a));
		if (hetero !== undefined) return { atoms: [hetero] };
	}
	if (site === 'alkyne') {
		const terminal = atoms.find((a) => molecule.getAtomicNo(a) === 6 && withH(a));
		if (terminal !== undefined) return { atoms: [terminal] };
	}
	if (site === 'diol') {
		const oxygens = atoms.filter((a) => molecule.getAtomicNo(a) === 8 && withH(a));
		if (oxygens.length === 2) return { atoms: oxygens };
	}
	if (site === 'carbonyl') {
		for (const carbon of atoms.filter((a) => molecule.getAtomicNo(a) === 6)) {
			for (let i = 0; i < molecule.getConnAtoms(carbon); i++) {
				const other = molecule.getConnAtom(carbon, i);
				if (molecule.getAtomicNo(other) === 8 && molecule.getConnBondOrder(carbon, i) === 2) {
					return { atoms: [carbon], leaving: other };
				}
			}
		}
	}
	throw new Error(`No ${site} site on atoms ${atoms.join(', ')} to draw the protecting group on.`);
}
