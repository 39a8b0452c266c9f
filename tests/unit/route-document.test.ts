import { describe, expect, it } from 'vitest';
import { validateRouteDocument, type RouteDocument } from '../../src/lib/route/document';

// A fictional three-step route: protect a ketone as its dioxolane, add a Grignard reagent to the
// ester, then remove the dioxolane (the textbook reason to mask a ketone — common practice).
const route: RouteDocument = {
	name: 'Cormorant route A',
	intermediates: [
		{ id: 'keto-ester', structure: 'CCOC(=O)CCC(C)=O', position: { x: 0, y: 0 } },
		{ id: 'protected', label: 'dioxolane', structure: 'CCOC(=O)CCC1(C)OCCO1' },
		{ id: 'alcohol', structure: 'CC1(CCC(C)(C)O)OCCO1' },
		{ id: 'target', structure: 'CC(=O)CCC(C)(C)O' }
	],
	steps: [
		{
			id: 's1',
			from: ['keto-ester'],
			to: 'protected',
			reagents: 'ethylene glycol, TsOH, toluene, reflux',
			intent: 'protect'
		},
		{ id: 's2', from: ['protected'], to: 'alcohol', reagents: 'MeMgBr, THF' },
		{ id: 's3', from: ['alcohol'], to: 'target', reagents: 'aq. HCl, acetone', intent: 'deprotect' }
	]
};

const problemsOf = (doc: unknown) => {
	const result = validateRouteDocument(doc);
	return result.ok ? [] : result.problems.map((p) => p.message);
};

describe('route documents', () => {
	it('accepts a well-formed route and keeps it as given', () => {
		const result = validateRouteDocument(route);
		expect(result).toEqual({ ok: true, document: route });
	});

	it('names duplicate ids', () => {
		const doc = {
			...route,
			intermediates: [...route.intermediates, { id: 'target', structure: 'C' }]
		};
		expect(problemsOf(doc)).toEqual(['Duplicate intermediate id "target".']);
		const steps = { ...route, steps: [...route.steps, { ...route.steps[0]!, to: 'alcohol' }] };
		expect(problemsOf(steps)).toEqual(['Duplicate step id "s1".']);
	});

	it('names dangling references', () => {
		const doc = { ...route, steps: [{ id: 'sx', from: ['nowhere'], to: 'elsewhere' }] };
		expect(problemsOf(doc)).toEqual([
			'Step "sx" starts from unknown intermediate "nowhere".',
			'Step "sx" leads to unknown intermediate "elsewhere".'
		]);
	});

	it('finds cycles and says which way they run', () => {
		const doc = {
			...route,
			steps: [...route.steps, { id: 'back', from: ['target'], to: 'protected' }]
		};
		expect(problemsOf(doc)).toEqual([
			'The steps form a cycle: protected → alcohol → target → protected.'
		]);
		expect(
			problemsOf({ ...route, steps: [{ id: 'self', from: ['target'], to: 'target' }] })
		).toEqual(['Step "self" leads back to its own starting intermediate "target".']);
	});

	it('accepts a convergent step with two inputs', () => {
		const doc: RouteDocument = {
			name: 'convergent',
			intermediates: [
				{ id: 'acid', structure: 'OC(=O)c1ccccc1' },
				{ id: 'amine', structure: 'NCc1ccccc1' },
				{ id: 'amide', structure: 'O=C(NCc1ccccc1)c1ccccc1' }
			],
			steps: [{ id: 'couple', from: ['acid', 'amine'], to: 'amide', reagents: 'EDC, HOBt, DMF' }]
		};
		expect(validateRouteDocument(doc).ok).toBe(true);
	});

	it('rejects the wrong shape with a path to the field', () => {
		const result = validateRouteDocument({ name: '', intermediates: [{ id: 'a' }], steps: 'none' });
		expect(result.ok).toBe(false);
		if (!result.ok) {
			expect(result.problems.map((p) => p.path.join('.')).sort()).toEqual([
				'intermediates.0.structure',
				'name',
				'steps'
			]);
		}
	});
});
