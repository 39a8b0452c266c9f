// Water a condensation gives up to a water-separating trap: theory from the limiting material,
// the azeotrope that carries it, and whether the trap must be drained.

import { loadAzeotropes, type Azeotrope } from '../rules/azeotropes';
import type { AzeotropeAnswer, WaterRemovalAnswer, WaterRemovalInput } from './contract';
import { QuantitiesError } from './errors';
import { trapProgress, type TrapProgress } from './trap-progress';
import { WATER_DENSITY, WATER_MOLAR_MASS } from './units';

/** The azeotrope row for a solvent id, e.g. `findAzeotrope('toluene').boilingPoint` → 84.1. */
export function findAzeotrope(solvent: string): Azeotrope {
	const rows = loadAzeotropes();
	const wanted = solvent.trim().toLowerCase();
	const row = rows.find((candidate) => candidate.id === wanted);
	if (!row) {
		const known = rows.map((candidate) => candidate.id);
		throw new QuantitiesError(
			'unknown_solvent',
			`No azeotrope with water is known for the solvent "${solvent}"; known: ${known.join(', ')}.`,
			{ field: 'waterRemoval.solvent', known }
		);
	}
	return row;
}

/**
 * mL of condensed distillate that carries `waterMass` g: the azeotrope's mass (water mass ÷ water
 * mass fraction) over its density, taken as the volume-weighted blend of the two liquids at room
 * temperature (volumes added; the mixing change is small beside the other uncertainties).
 */
export function distillateVolume(waterMass: number, azeotrope: Azeotrope): number {
	const waterFraction = azeotrope.waterMassPercent / 100;
	const azeotropeMass = waterMass / waterFraction;
	const density =
		1 / (waterFraction / WATER_DENSITY + (1 - waterFraction) / azeotrope.solventDensity);
	return azeotropeMass / density;
}

export function azeotropeAnswer(row: Azeotrope): AzeotropeAnswer {
	const { id, boilingPoint, solventBoilingPoint, waterMassPercent, waterLayer, source } = row;
	return { solvent: id, boilingPoint, solventBoilingPoint, waterMassPercent, waterLayer, source };
}

export type WaterRemoval = {
	answer: WaterRemovalAnswer;
	azeotrope: Azeotrope;
	progress?: TrapProgress;
};

/** e.g. 0.1665 mol aldehyde in toluene → 3.0 g, 3.0 mL of water at 20 °C, head near 84 °C. */
export function computeWaterRemoval(
	input: WaterRemovalInput,
	limitingAmount: number
): WaterRemoval {
	const azeotrope = findAzeotrope(input.solvent);
	const amount = limitingAmount * (input.waterPerMol ?? 1);
	const mass = amount * WATER_MOLAR_MASS;
	const volume = mass / WATER_DENSITY;
	const progress = input.log ? trapProgress(input.log, volume) : undefined;
	const answer: WaterRemovalAnswer = {
		theoretical: { amount, mass, volume },
		azeotrope: azeotropeAnswer(azeotrope),
		distillate: distillateVolume(mass, azeotrope),
		...(input.trapCapacity === undefined ? {} : { trapFills: volume > input.trapCapacity }),
		...(progress
			? {
					progress: {
						collected: progress.collected,
						percent: progress.percent,
						status: progress.status
					}
				}
			: {})
	};
	return { answer, azeotrope, progress };
}
