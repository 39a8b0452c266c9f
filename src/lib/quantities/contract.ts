import { z } from 'zod';
import { STRUCTURE_LIMITS } from '../chem/limits';
import { FIELD_LIMITS } from '../schemas/limits';
import { text } from '../schemas/text';

// The quantities of a step: what the chemist weighs out, and the water a condensation must give up
// to a water-separating trap. One source for the route document's `step.quantities` and
// `step.waterRemoval`, the body of `POST /api/quantities` and the answer it sends (issue 14).
// Units: g, mL, g/mL, mol, g/mol, °C, minutes.

export const MATERIAL_ROLES = ['limiting', 'reagent', 'catalyst', 'solvent', 'product'] as const;
export type MaterialRole = (typeof MATERIAL_ROLES)[number];

export const MAX_MATERIALS = 40;
export const MAX_TRAP_READINGS = 200;

const positive = (what: string) =>
	z.number().finite().positive(`${what} must be greater than zero.`);

/** One material as the chemist gives it: one amount (mass, volume, amount or equiv) and what is known. */
export const materialInput = z.object({
	name: text().trim().min(1, 'Name the material.').max(FIELD_LIMITS.materialName.max),
	role: z.enum(MATERIAL_ROLES),
	/** SMILES or molfile, or the id of an intermediate of the route (resolved before computing). */
	structure: text().max(STRUCTURE_LIMITS.maxTextBytes).optional(),
	molarMass: positive('A molar mass').optional(),
	mass: positive('A mass').optional(),
	volume: positive('A volume').optional(),
	density: positive('A density').optional(),
	amount: positive('An amount').optional(),
	equiv: positive('An equivalent count').optional()
});
export type MaterialInput = z.output<typeof materialInput>;

/** One trap reading: minutes since reflux began, mL of water collected so far. */
export const trapReading = z.object({
	minutes: z.number().finite().min(0, 'Minutes cannot be negative.'),
	volume: z.number().finite().min(0, 'A collected volume cannot be negative.')
});
export type TrapReading = z.output<typeof trapReading>;

/** Water removal for a condensation run at reflux with a water-separating trap. */
export const waterRemovalInput = z.object({
	/** An id of rules/azeotropes.json, e.g. `toluene`. */
	solvent: text().trim().min(1).max(64),
	/** Water formed per molecule of the limiting material; 1 for an acetal, ketal, ester or imine. */
	waterPerMol: positive('Water per mol').optional(),
	/** The trap's graduated capacity in mL. */
	trapCapacity: positive('A trap capacity').optional(),
	log: z.array(trapReading).max(MAX_TRAP_READINGS).optional()
});
export type WaterRemovalInput = z.output<typeof waterRemovalInput>;

/** `POST /api/quantities` body. */
export const quantitiesRequest = z.object({
	materials: z.array(materialInput).min(1, 'List at least one material.').max(MAX_MATERIALS),
	waterRemoval: waterRemovalInput.optional()
});
export type QuantitiesRequest = z.output<typeof quantitiesRequest>;

export const TRAP_STATUSES = ['collecting', 'complete', 'over-theory'] as const;
export type TrapStatus = (typeof TRAP_STATUSES)[number];
export const WATER_LAYERS = ['lower', 'upper'] as const;
export type WaterLayer = (typeof WATER_LAYERS)[number];

export type MaterialAnswer = {
	name: string;
	role: MaterialRole;
	molarMass: number;
	amount: number;
	mass: number;
	volume?: number;
	equiv: number;
	/** Catalysts only: mol % against the limiting material. */
	molPercent?: number;
};

export type AzeotropeAnswer = {
	solvent: string;
	boilingPoint: number;
	solventBoilingPoint: number;
	waterMassPercent: number;
	waterLayer: WaterLayer;
	source: string;
};

export type WaterRemovalAnswer = {
	theoretical: { amount: number; mass: number; volume: number };
	azeotrope: AzeotropeAnswer;
	/** mL of distillate (azeotrope) that must pass to carry the theoretical water. */
	distillate?: number;
	trapFills?: boolean;
	progress?: { collected: number; percent: number; status: TrapStatus };
};

export type Caution = { subject: string; message: string };

/** `POST /api/quantities` answer. */
export type QuantitiesAnswer = {
	materials: MaterialAnswer[];
	/** The limiting material's name. */
	limiting: string;
	/** Theoretical product mass (g) where the product's molar mass is known. */
	theoreticalYield?: number;
	/** mol/L of the limiting material in the solvent(s), where a solvent volume is given. */
	concentration?: number;
	waterRemoval?: WaterRemovalAnswer;
	cautions: Caution[];
};
