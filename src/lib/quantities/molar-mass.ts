// A material's molar mass: from its structure (openchemlib), else the molar mass the chemist gave,
// else the reagent dictionary by name. A typed figure wins over the dictionary because the
// dictionary holds one form (p-TsOH·H2O) and the chemist may weigh another (the anhydrous acid).

import { readStructure } from '../chem/parse';
import { molarMassOf } from '../chem/properties';
import type { MaterialInput } from './contract';
import type { PhysicalEntry } from './dictionary';
import { QuantitiesError } from './errors';

export type MolarMassSource = 'structure' | 'given' | 'dictionary';

/** e.g. `molarMassFor({ name: 'p-tolualdehyde', role: 'limiting', structure: 'Cc1ccc(C=O)cc1' })` → 120.15. */
export function molarMassFor(
	material: MaterialInput,
	entry: PhysicalEntry | undefined
): { value: number; from: MolarMassSource } | undefined {
	if (material.structure !== undefined && material.structure.trim() !== '') {
		try {
			return { value: molarMassOf(readStructure(material.structure).molecule), from: 'structure' };
		} catch (caught) {
			const reason = caught instanceof Error ? caught.message : 'it is not SMILES or a molfile';
			throw new QuantitiesError(
				'unreadable_structure',
				`${material.name}: the structure cannot be read (${reason}).`,
				{ material: material.name, field: 'structure' }
			);
		}
	}
	if (material.molarMass !== undefined) {
		return { value: material.molarMass, from: 'given' };
	}
	if (entry?.molarMass !== undefined) {
		return { value: entry.molarMass, from: 'dictionary' };
	}
	return undefined;
}
