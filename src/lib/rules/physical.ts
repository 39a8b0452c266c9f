/**
 * Physical data of a rules/reagents.json row, so a step's quantities need no density or molar mass
 * from the chemist (issue 14): g/mol, g/mL (liquids, 20–25 °C), °C at atmospheric pressure.
 * Kept in its own small file so the reagent schema gains one spread, not a block of fields.
 */
import { z } from 'zod';

export const physicalDataFields = {
	molarMass: z.number().finite().positive().optional(),
	/** Liquids only; a solid is weighed, so it has none. */
	density: z.number().finite().positive().optional(),
	/** Left out where the liquid boils only under reduced pressure. */
	boilingPoint: z.number().finite().optional(),
	/** Where the figures come from, e.g. "CRC Handbook … (from memory); density at 20 °C". */
	physicalSource: z.string().trim().min(1, 'must not be empty').optional()
};

type PhysicalData = {
	molarMass?: number;
	density?: number;
	boilingPoint?: number;
	physicalSource?: string;
};

/** A figure without a source is a load error, e.g. `{ density: 0.867 }` alone. */
export function unsourcedPhysicalData(row: PhysicalData): boolean {
	const hasFigure =
		row.molarMass !== undefined || row.density !== undefined || row.boilingPoint !== undefined;
	return hasFigure && row.physicalSource === undefined;
}
