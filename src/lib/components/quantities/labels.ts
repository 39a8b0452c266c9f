// How the quantities screens name the contract's roles (a Record, so a new role fails the type check).

import type { MaterialRole } from '$lib/quantities/contract';

export const ROLE_LABELS: Record<MaterialRole, string> = {
	limiting: 'Limiting',
	reagent: 'Reagent',
	catalyst: 'Catalyst',
	solvent: 'Solvent',
	product: 'Product'
};

/** Numbers at bench precision: 3 significant figures, no exponent for ordinary amounts. */
export function bench(value: number | undefined, digits = 3): string {
	if (value === undefined || !Number.isFinite(value)) {
		return '—';
	}
	return Number(value.toPrecision(digits)).toLocaleString('en', { maximumFractionDigits: 6 });
}
