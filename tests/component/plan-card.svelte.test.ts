import { render, screen, within } from '@testing-library/svelte';
import { describe, expect, it } from 'vitest';
import PlanCard from '$lib/components/route-map/PlanCard.svelte';
import type { CheckedPlan } from '$lib/rules/plan';
import { routeDoc } from './route-editor-fixture';

// A plan that masks nothing (so no editor is needed): what it says and what it asks of the chemist.
const plan = (over: Partial<CheckedPlan> = {}): CheckedPlan => ({
	rank: 2,
	score: 1,
	protections: [],
	route: routeDoc,
	addedSteps: 0,
	rationale: ['The ketone survives MeMgBr only if masked.'],
	hazards: [],
	cautions: [],
	unrecognized: [],
	...over
});
const names = new Map([['s1', 'MeMgBr step']]);

describe('PlanCard', () => {
	it('gives its rank, added steps and reasons, and names each hazard reagent once', () => {
		render(PlanCard, {
			plan: plan({
				hazards: [
					{ step: 's1', reagent: 'NaH', note: 'flammable hydrogen' },
					{ step: 's2', reagent: 'NaH', note: 'flammable hydrogen' }
				],
				unrecognized: [{ step: 's1', text: ['Grubbs II'] }]
			}),
			names,
			labels: null,
			saving: null
		});
		expect(screen.getByRole('heading', { name: 'Plan 2' })).toBeTruthy();
		expect(screen.getByText('No added steps')).toBeTruthy();
		expect(screen.getByText('The ketone survives MeMgBr only if masked.')).toBeTruthy();
		const care = screen.getByRole('region', { name: 'Take care with plan 2' });
		expect(within(care).getAllByText('NaH:')).toHaveLength(1);
		expect(
			within(screen.getByRole('list', { name: 'Reagents not recognised' })).getByRole('listitem')
				.textContent
		).toBe('MeMgBr step: Not recognised: Grubbs II — its effect is not checked.');
	});

	it('offers no "Use this plan" for a plan that masks nothing, and no safety section without notes', () => {
		render(PlanCard, { plan: plan(), names, labels: null, saving: null, onuse: () => {} });
		expect(screen.queryByRole('button', { name: 'Use this plan' })).toBeNull();
		expect(screen.queryByRole('region', { name: 'Take care with plan 2' })).toBeNull();
	});
});
