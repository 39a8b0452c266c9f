// The quantities engine on worked values a chemist can check by hand, its refusals, and the
// trap-log statuses.

import { describe, expect, it } from 'vitest';
import { computeQuantities } from '../../src/lib/quantities/compute';
import type { MaterialInput, QuantitiesRequest } from '../../src/lib/quantities/contract';
import { QuantitiesError } from '../../src/lib/quantities/errors';
import { trapProgress } from '../../src/lib/quantities/trap-progress';
import { distillateVolume, findAzeotrope } from '../../src/lib/quantities/water-removal';

// Worked values, common practice: 20.0 g of 4-methylbenzaldehyde (120.15 g/mol) is 0.1665 mol and
// gives 3.0 g (3.0 mL) of water on full conversion to its dioxolane; 12 mL of ethylene glycol
// (1.113 g/mL, 62.07 g/mol) is 0.215 mol, 1.29 equiv.
const aldehyde: MaterialInput = {
	name: '4-methylbenzaldehyde',
	role: 'limiting',
	structure: 'Cc1ccc(C=O)cc1',
	mass: 20.0
};
const glycol: MaterialInput = { name: 'ethylene glycol', role: 'reagent', volume: 12 };
const tsoh: MaterialInput = { name: 'p-TsOH·H2O', role: 'catalyst', equiv: 0.05 };
const toluene: MaterialInput = { name: 'toluene', role: 'solvent', volume: 75 };
const dioxolane: MaterialInput = {
	name: '2-(4-methylphenyl)-1,3-dioxolane',
	role: 'product',
	structure: 'Cc1ccc(C2OCCO2)cc1'
};
const acetalStep: QuantitiesRequest = {
	materials: [aldehyde, glycol, tsoh, toluene, dioxolane],
	waterRemoval: { solvent: 'toluene', trapCapacity: 10 }
};

function refusal(request: QuantitiesRequest): QuantitiesError {
	try {
		computeQuantities(request);
	} catch (caught) {
		if (caught instanceof QuantitiesError) {
			return caught;
		}
		throw caught;
	}
	throw new Error('expected a QuantitiesError');
}

describe('worked values', () => {
	const answer = computeQuantities(acetalStep);
	const row = (name: string) => answer.materials.find((m) => m.name === name)!;

	it('20.0 g 4-methylbenzaldehyde is 0.1665 mol (molar mass from the structure)', () => {
		expect(row('4-methylbenzaldehyde').molarMass).toBeCloseTo(120.15, 2);
		expect(row('4-methylbenzaldehyde').amount).toBeCloseTo(0.1665, 4);
		expect(row('4-methylbenzaldehyde').equiv).toBe(1);
		expect(answer.limiting).toBe('4-methylbenzaldehyde');
	});

	it('12 mL ethylene glycol is 0.215 mol, 1.29 equiv, with the dictionary density', () => {
		expect(row('ethylene glycol').mass).toBeCloseTo(12 * 1.113, 3);
		expect(row('ethylene glycol').amount).toBeCloseTo(0.215, 3);
		expect(row('ethylene glycol').equiv).toBeCloseTo(1.29, 2);
	});

	it('5 mol % p-TsOH·H2O weighs 1.58 g (monohydrate, 190.22 g/mol)', () => {
		expect(row('p-TsOH·H2O').molPercent).toBeCloseTo(5, 6);
		expect(row('p-TsOH·H2O').mass).toBeCloseTo(0.05 * 0.16646 * 190.22, 3);
	});

	it('theoretical product mass and the concentration in 75 mL toluene', () => {
		expect(answer.theoreticalYield).toBeCloseTo(0.16646 * 164.2, 1);
		expect(answer.concentration).toBeCloseTo(0.16646 / 0.075, 3);
	});

	it('the dioxolane releases 3.0 g, 3.0 mL of water; toluene–water distils near 84 °C; water below', () => {
		const water = answer.waterRemoval!;
		expect(water.theoretical.amount).toBeCloseTo(0.1665, 4);
		expect(water.theoretical.mass.toFixed(1)).toBe('3.0');
		expect(water.theoretical.volume.toFixed(1)).toBe('3.0');
		expect(water.azeotrope).toMatchObject({ solvent: 'toluene', waterLayer: 'lower' });
		expect(water.azeotrope.boilingPoint).toBeGreaterThanOrEqual(84);
		expect(water.azeotrope.boilingPoint).toBeLessThanOrEqual(85);
		expect(water.trapFills).toBe(false);
		expect(water.progress).toBeUndefined();
	});

	it('distillate: 3.0 g water at 20.2 % is 14.9 g of azeotrope, about 16 mL', () => {
		const mass = answer.waterRemoval!.theoretical.mass;
		// 1/ρ = 0.202/0.998 + 0.798/0.867 → ρ 0.891 g/mL; 14.85 g / 0.891 = 16.7 mL.
		expect(distillateVolume(mass, findAzeotrope('toluene'))).toBeCloseTo(16.7, 1);
		expect(answer.waterRemoval!.distillate).toBeCloseTo(16.7, 1);
	});

	it('waterPerMol 2 doubles the water; a 5 mL trap fills', () => {
		const twice = computeQuantities({
			materials: [aldehyde],
			waterRemoval: { solvent: 'toluene', waterPerMol: 2, trapCapacity: 5 }
		});
		expect(twice.waterRemoval!.theoretical.volume).toBeCloseTo(6.0, 1);
		expect(twice.waterRemoval!.trapFills).toBe(true);
		expect(twice.cautions.map((c) => c.message).join(' ')).toMatch(/drain it/);
	});

	it('cautions: flammable at reflux, acid catalyst, glycol, and the SDS last', () => {
		const text = answer.cautions.map((c) => c.message);
		expect(text.join(' ')).toMatch(/no open flame/);
		expect(text.join(' ')).toMatch(/never heat a closed system/);
		expect(text.join(' ')).toMatch(/p-TsOH·H2O is an acid catalyst and corrosive/);
		expect(text.join(' ')).toMatch(/ethylene glycol is toxic if swallowed/);
		expect(text.at(-1)).toMatch(/SDS/);
	});

	it('benzene: a carcinogen, toluene named instead; chloroform: the water floats', () => {
		const benzene = computeQuantities({
			materials: [aldehyde],
			waterRemoval: { solvent: 'benzene' }
		});
		expect(benzene.cautions.map((c) => c.message).join(' ')).toMatch(/known carcinogen.*toluene/);
		const chloroform = computeQuantities({
			materials: [aldehyde],
			waterRemoval: { solvent: 'chloroform' }
		});
		expect(chloroform.waterRemoval!.azeotrope.waterLayer).toBe('upper');
		expect(chloroform.cautions.map((c) => c.message).join(' ')).toMatch(/upper layer/);
	});
});

describe('refusals name the material or field', () => {
	it.each([
		['no limiting material', [{ ...glycol }], 'no_limiting', undefined],
		[
			'two limiting materials',
			[aldehyde, { ...glycol, role: 'limiting' as const }],
			'two_limiting',
			'ethylene glycol'
		],
		[
			'a volume with no known density',
			[aldehyde, { name: 'hexanal oil', role: 'reagent' as const, molarMass: 100, volume: 2 }],
			'no_density',
			'hexanal oil'
		],
		[
			'a row with no amount',
			[aldehyde, { name: 'ethylene glycol', role: 'reagent' as const }],
			'missing_amount',
			'ethylene glycol'
		],
		[
			'a limiting row given in equiv',
			[{ ...aldehyde, mass: undefined, equiv: 1 }],
			'missing_amount',
			'4-methylbenzaldehyde'
		],
		[
			'two amounts on one row',
			[aldehyde, { ...glycol, mass: 13 }],
			'two_amounts',
			'ethylene glycol'
		],
		[
			'an unknown molar mass',
			[aldehyde, { name: 'mystery oil', role: 'reagent' as const, mass: 1 }],
			'no_molar_mass',
			'mystery oil'
		],
		[
			'an unreadable structure',
			[{ ...aldehyde, structure: 'C1CC(' }],
			'unreadable_structure',
			'4-methylbenzaldehyde'
		]
	] as const)('%s', (_what, materials, code, material) => {
		const error = refusal({ materials: [...materials] as MaterialInput[] });
		expect(error.code).toBe(code);
		expect(error.details.material).toBe(material);
		if (material) {
			expect(error.message).toContain(material);
		}
	});

	it('an unknown solvent lists the known ids', () => {
		const error = refusal({ materials: [aldehyde], waterRemoval: { solvent: 'water' } });
		expect(error.code).toBe('unknown_solvent');
		expect(error.details.known).toContain('toluene');
		expect(error.message).toMatch(/known: .*toluene/);
	});

	it('a log whose times go backwards names the reading', () => {
		const log = [
			{ minutes: 0, volume: 0 },
			{ minutes: 30, volume: 1 },
			{ minutes: 20, volume: 1.5 }
		];
		const error = refusal({ materials: [aldehyde], waterRemoval: { solvent: 'toluene', log } });
		expect(error.code).toBe('log_out_of_order');
		expect(error.details.field).toBe('waterRemoval.log[2].minutes');
	});
});

describe('trap-log statuses (theory 3.0 mL)', () => {
	const reads = (...volumes: number[]) => volumes.map((volume, i) => ({ minutes: i * 30, volume }));

	it('levelled off at ≥ 95 % is complete', () => {
		expect(trapProgress(reads(0.8, 2.2, 2.9, 2.93, 2.95), 3.0)).toMatchObject({
			status: 'complete',
			collected: 2.95
		});
	});

	it('still rising near theory is collecting', () => {
		const progress = trapProgress(reads(0.8, 1.6, 2.3, 2.9), 3.0)!;
		expect(progress.status).toBe('collecting');
		expect(progress.percent).toBeCloseTo(96.7, 1);
	});

	it('one flat interval is not yet levelled off', () => {
		expect(trapProgress(reads(1.6, 2.9, 2.92), 3.0)!.status).toBe('collecting');
	});

	it('levelled off below 95 % stays collecting and says it stalled', () => {
		const progress = trapProgress(reads(1.5, 2.4, 2.42, 2.43), 3.0)!;
		expect(progress).toMatchObject({ status: 'collecting', stalled: true });
	});

	it('over 105 % is over-theory, and the caution says which layer to read', () => {
		expect(trapProgress(reads(1.2, 2.5, 3.4), 3.0)!.status).toBe('over-theory');
		const answer = computeQuantities({
			materials: [aldehyde],
			waterRemoval: { solvent: 'toluene', log: reads(1.2, 2.5, 3.4) }
		});
		expect(answer.waterRemoval!.progress).toMatchObject({ status: 'over-theory', collected: 3.4 });
		expect(answer.cautions.map((c) => c.message).join(' ')).toMatch(/wet.*droplets.*lower layer/);
	});

	it('an empty log has no progress', () => {
		expect(trapProgress([], 3.0)).toBeUndefined();
	});
});
