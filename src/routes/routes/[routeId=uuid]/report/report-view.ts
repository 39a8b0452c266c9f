// How the review copy words a step's check and a structure's text; pure, so it is tested alone.

import type { StepCheck } from '$lib/rules/check/types';
import { notCheckedText, unrecognizedText } from '$lib/components/route-map/step-view';

export type CheckReading =
	| { kind: 'not-checked'; text: string }
	| { kind: 'clashes'; clashes: StepCheck['clashes'] }
	| { kind: 'clean'; text: string };

/**
 * What the copy prints for a step's check: the clashes and cautions, "Not checked: …" when the
 * step (or the whole check, `routeNote`) could not be checked, else the plain all-clear, which
 * says when some reagents were not recognised. Never an all-clear for a step that was not checked.
 */
export function checkReading(check: StepCheck | null, routeNote: string | null): CheckReading {
	if (!check) {
		return {
			kind: 'not-checked',
			text: routeNote ?? 'Not checked: the check gave no answer for this step.'
		};
	}
	if (check.error) {
		return { kind: 'not-checked', text: notCheckedText(check.error) };
	}
	if (check.clashes.length) {
		return { kind: 'clashes', clashes: check.clashes };
	}
	return {
		kind: 'clean',
		text: unrecognizedText(check.unrecognized)
			? 'No clashes found for the reagents Orthogon recognised.'
			: 'No clashes found for these conditions.'
	};
}

/** The structure as one printable line: a SMILES as it is, a molfile by its kind (many lines). */
export function structureLine(structure: string): string | null {
	const text = structure.trim();
	if (!text) {
		return null;
	}
	return text.includes('\n') ? 'Given as a molfile (in the route’s SDF export).' : text;
}
