// How a step's check answer reads on the map: one verdict per step, worded for its marker.

import type { Clash, ConditionLabel, StepCheck } from '$lib/client/route-client';
import type { RouteStep } from '$lib/route/document';

export type Verdict = { tone: 'clash' | 'caution' | 'unchecked' | 'fine'; label: string };

/**
 * E.g. two clashes and a caution → `{ tone: 'clash', label: '2 clashes, 1 caution' }`; a step
 * the check refused → `{ tone: 'unchecked', label: 'Not checked: The product cannot be read — …' }`,
 * never `fine`: an empty clash list from a step that was not checked means nothing.
 */
export function verdictOf(check: StepCheck | undefined): Verdict {
	if (check?.error) {
		return { tone: 'unchecked', label: notCheckedText(check.error) };
	}
	const clashes = check?.clashes.filter((c) => c.severity === 'clash').length ?? 0;
	const cautions = (check?.clashes.length ?? 0) - clashes;
	const parts = [
		clashes ? `${clashes} ${clashes === 1 ? 'clash' : 'clashes'}` : '',
		cautions ? `${cautions} ${cautions === 1 ? 'caution' : 'cautions'}` : ''
	].filter(Boolean);
	return { tone: clashes ? 'clash' : cautions ? 'caution' : 'fine', label: parts.join(', ') };
}

/** E.g. `Not checked: The product cannot be read — it is empty.` */
export function notCheckedText(error: NonNullable<StepCheck['error']>): string {
	return `Not checked: ${error.message}`;
}

/**
 * The plain notice for reagent text the table did not know, or null when it knew every word, e.g.
 * `['Grubbs II']` → 'Not recognised: Grubbs II — its effect is not checked.'
 */
export function unrecognizedText(unrecognized: readonly string[] | undefined): string | null {
	if (!unrecognized?.length) {
		return null;
	}
	const effect = unrecognized.length === 1 ? 'its effect is' : 'their effects are';
	return `Not recognised: ${unrecognized.join(', ')} — ${effect} not checked.`;
}

/** The label of a condition class, or its id while the rule list is not available. */
export function conditionLabel(id: string, labels: ConditionLabel[] | null): string {
	return labels?.find((c) => c.id === id)?.label ?? id;
}

/**
 * The `highlight` for one substrate of a step: the clashes' atoms that fall in it. A convergent
 * step's atom indices run through its substrates joined in `from` order, so each substrate's
 * share is offset by the atom counts before it; e.g. atoms [1, 9] over substrates of 8 and 5
 * atoms give '1' for the first and '1' for the second.
 */
export function substrateHighlight(
	step: RouteStep,
	clashes: Clash[],
	intermediateId: string,
	atomCountOf: (intermediateId: string) => number | null
): string {
	const atoms = [...new Set(clashes.flatMap((c) => c.atoms))].sort((a, b) => a - b);
	if (!step.from.includes(intermediateId) || atoms.length === 0) {
		return '';
	}
	let offset = 0;
	for (const from of step.from) {
		const count = step.from.length === 1 ? Infinity : atomCountOf(from);
		if (count === null) {
			return '';
		}
		if (from === intermediateId) {
			return atoms
				.filter((a) => a >= offset && a < offset + count)
				.map((a) => a - offset)
				.join(',');
		}
		offset += count;
	}
	return '';
}

/** Non-hydrogen atoms of a formula, e.g. 'C7H12O3' → 10: SMILES carry their hydrogens implicitly. */
export function heavyAtomCount(formula: string): number {
	let count = 0;
	for (const [, element, n] of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) {
		if (element !== 'H') {
			count += n ? Number(n) : 1;
		}
	}
	return count;
}
