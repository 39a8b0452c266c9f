// The reagent dictionary's physical data (rules/reagents.json) found by a material's name, so
// "ethylene glycol, 12 mL" needs no density from the chemist.

import { foldText } from '../rules/normalize';
import type { Reagent } from '../rules/schemas';
import { loadRuleTable } from '../rules/table';

export type PhysicalEntry = Pick<
	Reagent,
	'name' | 'molarMass' | 'density' | 'boilingPoint' | 'physicalSource' | 'conditions'
>;

// Spellings of an isotopologue (CDCl3, D2O) share a row with the plain solvent but not its mass.
const ISOTOPE_LABELLED = /^d2o$|cdcl3|cd3|-d\d+$/;

let byName: Map<string, Reagent> | null = null;

function fold(name: string): string {
	return foldText(name.trim()).replace(/\s+/g, ' ');
}

function index(): Map<string, Reagent> {
	if (byName) {
		return byName;
	}
	byName = new Map();
	for (const reagent of loadRuleTable().reagents) {
		for (const spelling of [reagent.name, ...reagent.synonyms]) {
			const key = fold(spelling);
			if (!ISOTOPE_LABELLED.test(key) && !byName.has(key)) {
				byName.set(key, reagent);
			}
		}
	}
	return byName;
}

/** The dictionary row a name or synonym means, e.g. `lookupReagent('Ethylene glycol')?.density` → 1.113. */
export function lookupReagent(name: string): PhysicalEntry | undefined {
	return index().get(fold(name));
}
