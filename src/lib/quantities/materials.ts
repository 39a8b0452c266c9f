// Per-row quantities: mol, mass, volume and equivalents from the one amount each row gives.

import type { MaterialAnswer, MaterialInput } from './contract';
import { lookupReagent, type PhysicalEntry } from './dictionary';
import { QuantitiesError } from './errors';
import { molarMassFor } from './molar-mass';

const AMOUNT_FIELDS = ['mass', 'volume', 'amount', 'equiv'] as const;

export type ComputedMaterial = MaterialAnswer & { input: MaterialInput; entry?: PhysicalEntry };

function onlyAmountField(material: MaterialInput) {
	const given = AMOUNT_FIELDS.filter((field) => material[field] !== undefined);
	if (given.length > 1) {
		throw new QuantitiesError(
			'two_amounts',
			`${material.name}: give one amount, not ${given.join(' and ')}.`,
			{ material: material.name, field: given[1] }
		);
	}
	return given[0];
}

/** The single limiting row, e.g. the aldehyde of an acetal protection. */
export function findLimiting(materials: readonly MaterialInput[]): MaterialInput {
	const limiting = materials.filter((material) => material.role === 'limiting');
	if (limiting.length === 0) {
		throw new QuantitiesError(
			'no_limiting',
			'No material has the role "limiting": mark the one the equivalents are counted against.',
			{ field: 'role' }
		);
	}
	if (limiting.length > 1) {
		const names = limiting.map((material) => material.name).join(', ');
		throw new QuantitiesError(
			'two_limiting',
			`Only one material can be limiting; these are all marked so: ${names}.`,
			{ field: 'role', material: limiting[1]!.name }
		);
	}
	return limiting[0]!;
}

/**
 * mol of one row, e.g. 12 mL ethylene glycol (dictionary density 1.113 g/mL) → 0.2152 mol.
 * `limitingAmount` is undefined while the limiting row itself is computed.
 */
export function computeMaterial(
	material: MaterialInput,
	limitingAmount: number | undefined
): ComputedMaterial {
	const entry = lookupReagent(material.name);
	const molar = molarMassFor(material, entry);
	if (!molar) {
		throw new QuantitiesError(
			'no_molar_mass',
			`${material.name}: no molar mass is known; give a structure or molarMass.`,
			{ material: material.name, field: 'molarMass' }
		);
	}
	const molarMass = molar.value;
	const density = material.density ?? entry?.density;
	const field = onlyAmountField(material);
	let amount: number;
	if (field === 'mass') {
		amount = material.mass! / molarMass;
	} else if (field === 'amount') {
		amount = material.amount!;
	} else if (field === 'volume') {
		if (density === undefined) {
			throw new QuantitiesError(
				'no_density',
				`${material.name}: a volume needs a density, and none is known for it; give density (g/mL) or a mass.`,
				{ material: material.name, field: 'density' }
			);
		}
		amount = (material.volume! * density) / molarMass;
	} else if (field === 'equiv' && limitingAmount !== undefined) {
		amount = material.equiv! * limitingAmount;
	} else if (field === undefined && material.role === 'product' && limitingAmount !== undefined) {
		// A product row without an amount is the theoretical yield: one product per limiting molecule.
		amount = limitingAmount;
	} else {
		const why =
			material.role === 'limiting'
				? 'the limiting material is what equivalents count against, so give it a mass, volume or amount'
				: 'give a mass, volume, amount or equiv';
		throw new QuantitiesError('missing_amount', `${material.name}: no amount; ${why}.`, {
			material: material.name,
			field: 'mass'
		});
	}
	const mass = amount * molarMass;
	const equiv = limitingAmount === undefined ? 1 : amount / limitingAmount;
	return {
		input: material,
		entry,
		name: material.name,
		role: material.role,
		molarMass,
		amount,
		mass,
		...(density === undefined ? {} : { volume: mass / density }),
		equiv,
		...(material.role === 'catalyst' ? { molPercent: equiv * 100 } : {})
	};
}

/** Every row against the one limiting row; rows keep the order they were given in. */
export function computeMaterials(materials: readonly MaterialInput[]): ComputedMaterial[] {
	const limitingInput = findLimiting(materials);
	const limiting = computeMaterial(limitingInput, undefined);
	return materials.map((material) =>
		material === limitingInput ? limiting : computeMaterial(material, limiting.amount)
	);
}
