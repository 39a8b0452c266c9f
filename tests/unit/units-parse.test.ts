import { describe, expect, it } from 'vitest';
import {
	amountOf,
	formatAmount,
	parseAmount,
	withAmount
} from '../../src/lib/client/quantities-units';

const read = (typed: string) => {
	const reading = parseAmount(typed);
	if (!reading.ok) {
		throw new Error(`refused ${typed}: ${reading.message}`);
	}
	return reading.amount;
};
const refusal = (typed: string) => {
	const reading = parseAmount(typed);
	if (reading.ok) {
		throw new Error(`read ${typed} as ${JSON.stringify(reading.amount)}`);
	}
	return reading.message;
};

describe('parseAmount: units as chemists write them, into the contract units', () => {
	it.each([
		['20 g', 'mass', 20],
		['250 mg', 'mass', 0.25],
		['1.5 kg', 'mass', 1500],
		['12 mL', 'volume', 12],
		['12ml', 'volume', 12],
		['0.5 L', 'volume', 500],
		['2 µL', 'volume', 0.002],
		['2 μL', 'volume', 0.002], // Greek mu, as some keyboards type it
		['2 uL', 'volume', 0.002],
		['1.2 equiv', 'equiv', 1.2],
		['1.2 eq', 'equiv', 1.2],
		['1.2 eq.', 'equiv', 1.2],
		['5 mol%', 'equiv', 0.05],
		['5 mol %', 'equiv', 0.05],
		['0.17 mol', 'amount', 0.17],
		['3 mmol', 'amount', 0.003],
		['.5 g', 'mass', 0.5],
		['  20   G ', 'mass', 20]
	])('%s → %s %d', (typed, field, value) => {
		expect(read(typed)).toEqual({ field, value });
	});

	it('refuses an empty field, a bare number, an unknown unit, zero and negatives, with why', () => {
		expect(refusal('')).toMatch(/Type an amount/);
		expect(refusal('20')).toMatch(/Give a unit after 20/);
		expect(refusal('20 oz')).toMatch(/“oz” is not a unit.*mL.*mol%/);
		expect(refusal('g 20')).toMatch(/does not start with a number/);
		expect(refusal('0 g')).toMatch(/greater than zero/);
		expect(refusal('-3 mL')).toMatch(/greater than zero/);
		expect(refusal('1,5 g')).toMatch(/decimals with a point: 1.5 g/);
	});
});

describe('formatAmount writes a stored amount back as a chemist types it', () => {
	it.each([
		[{ field: 'mass', value: 20 }, undefined, '20 g'],
		[{ field: 'mass', value: 0.25 }, undefined, '250 mg'],
		[{ field: 'mass', value: 1500 }, undefined, '1.5 kg'],
		[{ field: 'volume', value: 0.002 }, undefined, '2 µL'],
		[{ field: 'volume', value: 75 }, undefined, '75 mL'],
		[{ field: 'amount', value: 0.003 }, undefined, '3 mmol'],
		[{ field: 'equiv', value: 0.05 }, 'catalyst', '5 mol%'],
		[{ field: 'equiv', value: 1.2 }, 'reagent', '1.2 equiv']
	] as const)('%o (%s) → %s', (amount, role, text) => {
		expect(formatAmount(amount, role)).toBe(text);
		// What is written back reads back to the same amount.
		expect(read(text)).toEqual(amount);
	});
});

describe('one amount per material', () => {
	it('withAmount replaces whichever amount the row had', () => {
		const glycol = { name: 'ethylene glycol', role: 'reagent' as const, equiv: 1.5 };
		const next = withAmount(glycol, { field: 'volume', value: 12 });
		expect(next).toEqual({ name: 'ethylene glycol', role: 'reagent', volume: 12 });
		expect(amountOf(next)).toEqual({ field: 'volume', value: 12 });
		expect(amountOf(withAmount(next, null))).toBeNull();
	});
});
