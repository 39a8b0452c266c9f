import { render, screen, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import ReportStep from '../../src/routes/routes/[routeId=uuid]/report/ReportStep.svelte';
import { REAGENT_SDS_CAUTION } from '$lib/quantities/cautions';
import type { CopyMolecule, CopyStep } from '$lib/server/services/review-copy';
import type { StepCheck } from '$lib/rules/check/types';

// One step of the printed review copy: what it says about the check, hazards, quantities and
// drawings, above all when something could not be checked or drawn.

const molecule = (id: string, over: Partial<CopyMolecule> = {}): CopyMolecule => ({
	id,
	label: id,
	structure: 'CCO',
	svg: '<svg data-testid="svg"></svg>',
	formula: 'C2H6O',
	notDrawn: null,
	...over
});
const molecules = {
	a: molecule('alcohol'),
	b: molecule('sketch', {
		svg: null,
		formula: null,
		structure: 'C1CC',
		notDrawn: 'Not drawn: the structure cannot be read.'
	})
};
const check = (over: Partial<StepCheck> = {}): StepCheck =>
	({ id: 's', conditions: [], hazards: [], clashes: [], unrecognized: [], ...over }) as StepCheck;
const step = (over: Partial<CopyStep> = {}): CopyStep => ({
	id: 's',
	number: 2,
	from: ['a'],
	to: 'b',
	reagents: 'TBAF, THF',
	notes: null,
	conditions: [{ id: 'fluoride', label: 'Fluoride', byHand: false }],
	check: check(),
	quantities: null,
	threads: [],
	...over
});
const text = (el: HTMLElement) => el.textContent?.replace(/\s+/g, ' ').trim();

describe('ReportStep', () => {
	it('names the step by its intermediates and prints the drawing, or the not-drawn note and the SMILES', () => {
		render(ReportStep, { step: step(), molecules, checkNote: null });
		expect(screen.getByRole('heading', { level: 2 }).textContent).toContain(
			'Step 2: alcohol → sketch'
		);
		expect(screen.getAllByRole('img')).toHaveLength(1);
		expect(text(screen.getByTestId('not-drawn'))).toBe('Not drawn: the structure cannot be read.');
		expect(screen.getByText('C1CC')).toBeTruthy();
	});

	it('prints clashes, or "Not checked" for a refused step, never an all-clear', () => {
		const clash = {
			severity: 'clash',
			message: 'TBAF would remove the TBS group.'
		} as StepCheck['clashes'][number];
		const { unmount } = render(ReportStep, {
			step: step({ check: check({ clashes: [clash] }) }),
			molecules,
			checkNote: null
		});
		expect(text(screen.getByTestId('step-check'))).toBe('Clash: TBAF would remove the TBS group.');
		unmount();

		render(ReportStep, {
			step: step({
				check: check({
					error: { code: 'invalid_structure', message: 'The product cannot be read.' }
				})
			}),
			molecules,
			checkNote: null
		});
		expect(text(screen.getByTestId('step-check'))).toBe('Not checked: The product cannot be read.');
	});

	it('says the whole check did not run when it timed out', () => {
		render(ReportStep, {
			step: step({ check: null }),
			molecules,
			checkNote: 'Not checked: The chemistry took longer than 10 s.'
		});
		expect(text(screen.getByTestId('step-check'))).toBe(
			'Not checked: The chemistry took longer than 10 s.'
		);
	});

	it('says which reagents were not recognised beside an all-clear', () => {
		render(ReportStep, {
			step: step({ check: check({ unrecognized: ['Grubbs II'] }) }),
			molecules,
			checkNote: null
		});
		expect(text(screen.getByTestId('step-check'))).toBe(
			'No clashes found for the reagents Orthogon recognised. Not recognised: Grubbs II — its effect is not checked.'
		);
	});

	it('lists each reagent hazard once, with the SDS caution', () => {
		const hazard = { reagent: 'TBAF', note: 'Corrosive.' };
		render(ReportStep, {
			step: step({ check: check({ hazards: [hazard, hazard] }) }),
			molecules,
			checkNote: null
		});
		const hazards = screen.getByTestId('step-hazards');
		expect(within(hazards).getAllByRole('listitem').map(text)).toEqual(['TBAF: Corrosive.']);
		expect(hazards.textContent).toContain(REAGENT_SDS_CAUTION);
	});

	it('prints computed quantities, or why they were not computed', () => {
		const { unmount } = render(ReportStep, {
			step: step({
				quantities: { notComputed: 'Enter how much phenol ester you use (e.g. 20 g).' }
			}),
			molecules,
			checkNote: null
		});
		expect(text(screen.getByTestId('step-quantities'))).toBe(
			'Enter how much phenol ester you use (e.g. 20 g).'
		);
		unmount();
		render(ReportStep, {
			step: step({
				quantities: {
					computed: {
						materials: [
							{
								name: 'ester',
								role: 'limiting',
								molarMass: 266.41,
								amount: 0.01,
								mass: 2.664,
								equiv: 1
							}
						],
						limiting: 'ester',
						cautions: [{ subject: 'Safety', message: 'Read each SDS.' }]
					}
				}
			}),
			molecules,
			checkNote: null
		});
		expect(screen.getByRole('table', { name: 'Computed quantities' })).toBeTruthy();
		expect(screen.getByTestId('step-quantities').textContent).toContain('Read each SDS.');
	});
});
