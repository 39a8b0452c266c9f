// Amounts as chemists type them ("20 g", "250 mg", "12 mL", "1.2 equiv", "5 mol%") read into the
// one field of the quantities contract they mean, in its units (g, mL, mol, equiv), and back.
// A table of our own rather than a units package: no general units library knows equivalents or
// mol %, and the few units a bench uses need no dimensional algebra.

import type { MaterialInput } from '$lib/quantities/contract';

export type AmountField = 'mass' | 'volume' | 'amount' | 'equiv';
/** Exactly one amount of a material, in the contract's units. */
export type Amount = { field: AmountField; value: number };
export type AmountReading = { ok: true; amount: Amount } | { ok: false; message: string };

type Unit = { field: AmountField; factor: number };

// Keys are lower-cased; µ may come as the micro sign (U+00B5), Greek mu (U+03BC) or a plain u.
const UNITS: Record<string, Unit> = {
	kg: { field: 'mass', factor: 1000 },
	g: { field: 'mass', factor: 1 },
	mg: { field: 'mass', factor: 1e-3 },
	µg: { field: 'mass', factor: 1e-6 },
	l: { field: 'volume', factor: 1000 },
	ml: { field: 'volume', factor: 1 },
	µl: { field: 'volume', factor: 1e-3 },
	mol: { field: 'amount', factor: 1 },
	mmol: { field: 'amount', factor: 1e-3 },
	µmol: { field: 'amount', factor: 1e-6 },
	equiv: { field: 'equiv', factor: 1 },
	eq: { field: 'equiv', factor: 1 },
	'mol%': { field: 'equiv', factor: 1e-2 }
};

const KNOWN = 'g, mg, kg, mL, L, µL, mol, mmol, µmol, equiv (or eq) and mol%';
const NUMBER_THEN_UNIT = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)\s*(.*)$/i;

/** Trims float noise from unit conversions: 0.1 * 3 → 0.3, not 0.30000000000000004. */
const tidy = (value: number) => Number(value.toPrecision(12));

function unitKey(unit: string): string {
	return unit
		.toLowerCase()
		.replace(/[\u00b5\u03bc]/g, 'µ')
		.replace(/^u(?=g$|l$|mol$)/, 'µ')
		.replace(/\.$/, '')
		.replace(/\s+/g, '')
		.replace(/^%$/, 'mol%');
}

/**
 * Reads one typed amount, e.g. `'250 mg'` → `{ field: 'mass', value: 0.25 }`, `'5 mol%'` →
 * `{ field: 'equiv', value: 0.05 }`; refuses what it cannot read with a message that says why.
 */
export function parseAmount(typed: string): AmountReading {
	const text = typed.trim();
	if (!text) {
		return { ok: false, message: 'Type an amount with its unit, e.g. 20 g or 1.2 equiv.' };
	}
	if (/^\d+,\d+/.test(text)) {
		return { ok: false, message: `Write decimals with a point: ${text.replace(',', '.')}.` };
	}
	const match = NUMBER_THEN_UNIT.exec(text);
	if (!match) {
		return { ok: false, message: `“${text}” does not start with a number.` };
	}
	const number = Number(match[1]);
	const unitText = (match[2] ?? '').trim();
	if (!unitText) {
		return { ok: false, message: `Give a unit after ${match[1]}: ${KNOWN}.` };
	}
	const unit = UNITS[unitKey(unitText)];
	if (!unit) {
		return { ok: false, message: `“${unitText}” is not a unit Orthogon reads; use ${KNOWN}.` };
	}
	if (!Number.isFinite(number) || number <= 0) {
		return { ok: false, message: 'An amount must be greater than zero.' };
	}
	return { ok: true, amount: { field: unit.field, value: tidy(number * unit.factor) } };
}

/** The amount a material carries, whichever field holds it (the first, in contract order). */
export function amountOf(material: MaterialInput): Amount | null {
	for (const field of ['mass', 'volume', 'amount', 'equiv'] as const) {
		const value = material[field];
		if (value !== undefined) {
			return { field, value };
		}
	}
	return null;
}

/**
 * A stored amount written back the way a chemist would type it, e.g. mass 0.25 → '250 mg',
 * a catalyst's equiv 0.05 → '5 mol%', volume 0.002 → '2 µL'.
 */
export function formatAmount(amount: Amount, role?: MaterialInput['role']): string {
	const { field, value } = amount;
	if (field === 'equiv') {
		return role === 'catalyst' && value < 1 ? `${tidy(value * 100)} mol%` : `${tidy(value)} equiv`;
	}
	// Largest unit in which the number is at least 1 (the last one takes whatever is left).
	const scales: Record<Exclude<AmountField, 'equiv'>, [string, number][]> = {
		mass: [
			['kg', 1000],
			['g', 1],
			['mg', 1e-3],
			['µg', 1e-6]
		],
		volume: [
			['L', 1000],
			['mL', 1],
			['µL', 1e-3]
		],
		amount: [
			['mol', 1],
			['mmol', 1e-3],
			['µmol', 1e-6]
		]
	};
	const units = scales[field];
	const [unit, factor] = units.find(([, f]) => value >= f) ?? units.at(-1)!;
	return `${tidy(value / factor)} ${unit}`;
}

/** The material with its amount replaced: the contract holds exactly one amount per row. */
export function withAmount(material: MaterialInput, amount: Amount | null): MaterialInput {
	const { mass: _m, volume: _v, amount: _a, equiv: _e, ...rest } = material;
	return amount ? { ...rest, [amount.field]: amount.value } : rest;
}
