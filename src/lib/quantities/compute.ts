// The quantities engine: what to weigh out for a step and the water its trap should collect.
// Pure: the caller resolves route intermediate ids to structures first.

import type { QuantitiesAnswer, QuantitiesRequest } from './contract';
import { cautionsFor } from './cautions';
import { computeMaterials, type ComputedMaterial } from './materials';
import { computeWaterRemoval } from './water-removal';

/** mol/L of the limiting material over the solvents' total volume, where any solvent has one. */
function concentration(limiting: ComputedMaterial, rows: readonly ComputedMaterial[]) {
	const litres = rows
		.filter((row) => row.role === 'solvent' && row.volume !== undefined)
		.reduce((sum, row) => sum + row.volume! / 1000, 0);
	return litres > 0 ? limiting.amount / litres : undefined;
}

/**
 * e.g. 20.0 g 4-methylbenzaldehyde (limiting), 12 mL ethylene glycol, toluene trap →
 * glycol 1.29 equiv, 3.0 mL theoretical water. Throws QuantitiesError for input it cannot use.
 */
export function computeQuantities(request: QuantitiesRequest): QuantitiesAnswer {
	const rows = computeMaterials(request.materials);
	const limiting = rows.find((row) => row.role === 'limiting')!;
	const product = rows.find((row) => row.role === 'product');
	const removal = request.waterRemoval
		? computeWaterRemoval(request.waterRemoval, limiting.amount)
		: undefined;
	const molar = concentration(limiting, rows);
	return {
		materials: rows.map(({ input: _input, entry: _entry, ...answer }) => answer),
		limiting: limiting.name,
		...(product ? { theoreticalYield: product.mass } : {}),
		...(molar === undefined ? {} : { concentration: molar }),
		...(removal ? { waterRemoval: removal.answer } : {}),
		cautions: cautionsFor(rows, removal)
	};
}
