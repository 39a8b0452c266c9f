// Everything /api/analyze answers, as one pure function of the request fields, so scripts and
// tests get the same answer as the endpoint.

import { depictSvg } from './depict';
import { highlightAtoms } from './highlight';
import { STRUCTURE_LIMITS } from './limits';
import { readStructure } from './parse';
import { perceiveWithKey } from './perception-cache';
import { canonicalForm, formulaOf, molarMassOf } from './properties';

export type AnalyzeOptions = { depict?: boolean; highlight?: string };

export type Analysis = {
	formula: string;
	mass: number;
	canonical: string;
	groups: { id: string; atoms: number[] }[];
	protectingGroups: { id: string; atoms: number[]; masks: string }[];
	svg?: string;
	/** Why a requested drawing was not made (the structure is over the drawing limit). */
	drawingSkipped?: string;
};

/** Reads, validates and perceives one structure, e.g. `analyzeStructure('CC(C)(C)OC(=O)NCCO', { depict: true, highlight: 'Boc' })`. */
export function analyzeStructure(text: string, options: AnalyzeOptions = {}): Analysis {
	// Coordinates let a SMILES keep its stereo, so stereoisomers get different canonical keys.
	const { molecule } = readStructure(text, { coordinates: true });
	const form = canonicalForm(molecule);
	const perception = perceiveWithKey(molecule, form);
	const highlight = options.highlight
		? highlightAtoms(options.highlight, perception, molecule.getAllAtoms())
		: [];
	const analysis: Analysis = {
		formula: formulaOf(molecule),
		mass: molarMassOf(molecule),
		canonical: form.key,
		groups: perception.groups.map(({ id, atoms }) => ({ id, atoms })),
		protectingGroups: perception.protectingGroups.map(({ id, atoms, masks }) => ({
			id,
			atoms,
			masks
		}))
	};
	if (!options.depict) {
		return analysis;
	}
	const heavyAtoms = countHeavyAtoms(molecule);
	if (heavyAtoms > STRUCTURE_LIMITS.maxDrawingHeavyAtoms) {
		analysis.drawingSkipped = `No drawing: the structure has ${heavyAtoms} heavy atoms, and drawings are made for up to ${STRUCTURE_LIMITS.maxDrawingHeavyAtoms}. The analysis above is complete.`;
	} else {
		analysis.svg = depictSvg(molecule, { highlight });
	}
	return analysis;
}

function countHeavyAtoms(molecule: ReturnType<typeof readStructure>['molecule']): number {
	let heavy = 0;
	for (let atom = 0; atom < molecule.getAllAtoms(); atom++) {
		if (molecule.getAtomicNo(atom) !== 1) {
			heavy += 1;
		}
	}
	return heavy;
}
