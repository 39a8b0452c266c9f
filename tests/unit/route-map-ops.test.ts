import { describe, expect, it } from 'vitest';
import * as ops from '../../src/lib/components/route-map/document-ops';
import {
	heavyAtomCount,
	substrateHighlight,
	unrecognizedText,
	verdictOf
} from '../../src/lib/components/route-map/step-view';
import type { StepCheck } from '../../src/lib/rules/check/types';
import { validateRouteDocument, type RouteDocument } from '../../src/lib/route/document';

const base: RouteDocument = {
	name: 'OG-2031',
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC', position: { x: 0, y: 0 } },
		{ id: 'b', structure: 'CC1(CCC(=O)OC)OCCO1', position: { x: 320, y: 0 } },
		{ id: 'g', structure: 'OCCO', position: { x: 0, y: 300 } }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'TsOH' }]
};

describe('route map document edits', () => {
	it('places a new intermediate right of the rightmost one', () => {
		const next = ops.addIntermediate(base, { id: 'c', structure: 'C' });
		expect(next.intermediates.at(-1)!.position).toEqual({ x: 320 + ops.NODE_WIDTH + 80, y: 0 });
		expect(base.intermediates).toHaveLength(3);
	});

	it('connects two intermediates with a new step, or adds an input to the product’s step', () => {
		const linear = ops.connect(base, 'b', 'g');
		expect(linear.ok && linear.doc.steps.at(-1)).toMatchObject({ from: ['b'], to: 'g' });
		const convergent = ops.connect(base, 'g', 'b');
		expect(convergent.ok && convergent.doc.steps).toEqual([
			{ id: 's1', from: ['a', 'g'], to: 'b', reagents: 'TsOH' }
		]);
		if (convergent.ok) {
			expect(validateRouteDocument(convergent.doc).ok).toBe(true);
		}
	});

	it('refuses a step that closes a cycle or repeats one', () => {
		expect(ops.connect(base, 'b', 'a')).toEqual({
			ok: false,
			reason: 'That step would lead back to where the route started.'
		});
		expect(ops.connect(base, 'a', 'a').ok).toBe(false);
		expect(ops.connect(base, 'a', 'b')).toEqual({
			ok: false,
			reason: 'Those intermediates are already joined by a step.'
		});
	});

	it('removes an intermediate with the steps that need it, or just one input of a convergent step', () => {
		expect(ops.removeElements(base, ['a'], []).steps).toEqual([]);
		const convergent = ops.connect(base, 'g', 'b');
		if (!convergent.ok) {
			throw new Error('expected a step');
		}
		expect(
			ops.removeElements(convergent.doc, [], [{ stepId: 's1', from: 'g' }]).steps[0]!.from
		).toEqual(['a']);
		expect(ops.removeElements(convergent.doc, ['g'], []).steps[0]!.from).toEqual(['a']);
		expect(ops.removeElements(convergent.doc, [], [], ['s1']).steps).toEqual([]);
	});

	it('leaves empty optional fields out and keeps an unchanged document identical', () => {
		expect(ops.updateStep(base, 's1', { reagents: '' }).steps[0]).toEqual({
			id: 's1',
			from: ['a'],
			to: 'b'
		});
		expect(ops.movePositions(base, new Map([['a', { x: 0, y: 0 }]]))).toBe(base);
	});

	it('lays a route out left to right with dagre', async () => {
		const positions = await ops.layoutPositions(base);
		expect(positions.get('b')!.x).toBeGreaterThan(positions.get('a')!.x);
	});
});

describe('clash highlights on substrates', () => {
	const clash = (atoms: number[]) => ({
		severity: 'clash' as const,
		kind: 'attacks-free-group' as const,
		subject: 'ketone',
		condition: 'organometallic',
		atoms,
		message: ''
	});
	const counts = (id: string) => ({ x: 8, y: 5 })[id] ?? null;

	it('passes a single substrate’s atoms through, and splits a convergent step’s atoms by substrate', () => {
		const single = { id: 's', from: ['x'], to: 'z' };
		expect(substrateHighlight(single, [clash([3, 1]), clash([1, 2])], 'x', counts)).toBe('1,2,3');
		expect(substrateHighlight(single, [clash([1])], 'z', counts)).toBe('');
		const convergent = { id: 's', from: ['x', 'y'], to: 'z' };
		expect(substrateHighlight(convergent, [clash([1, 9])], 'x', counts)).toBe('1');
		expect(substrateHighlight(convergent, [clash([1, 9])], 'y', counts)).toBe('1');
		expect(substrateHighlight(convergent, [clash([9])], 'y', () => null)).toBe('');
	});

	it('counts heavy atoms from a formula', () => {
		expect(heavyAtomCount('C7H12O3')).toBe(10);
		expect(heavyAtomCount('C2H6BrN')).toBe(4);
	});
});

describe('a step’s verdict on the map', () => {
	const answer = (extra: Partial<StepCheck> = {}): StepCheck => ({
		id: 's1',
		conditions: [],
		hazards: [],
		clashes: [],
		unrecognized: [],
		...extra
	});

	it('never reads a step that could not be checked as fine, and says why it was not', () => {
		const error = {
			code: 'invalid_structure',
			message: 'The product cannot be read — it is empty.'
		};
		expect(verdictOf(answer({ error }))).toEqual({
			tone: 'unchecked',
			label: 'Not checked: The product cannot be read — it is empty.'
		});
		expect(verdictOf(answer())).toEqual({ tone: 'fine', label: '' });
	});

	it('names unrecognised reagent text plainly, and nothing when every reagent was known', () => {
		expect(unrecognizedText(['Grubbs II'])).toBe(
			'Not recognised: Grubbs II — its effect is not checked.'
		);
		expect(unrecognizedText(['OG-Cat 17', 'Zq-ligand 5'])).toBe(
			'Not recognised: OG-Cat 17, Zq-ligand 5 — their effects are not checked.'
		);
		expect(unrecognizedText([])).toBeNull();
		expect(unrecognizedText(undefined)).toBeNull();
	});
});

describe('the canvas shows the editor’s selection', () => {
	it('marks exactly the intermediate the editor selected, and follows a new selection', async () => {
		const { toNodes } = await import('../../src/lib/components/route-map/flow');
		const first = toNodes(base, [], true, 'g');
		expect(first.filter((n) => n.selected).map((n) => n.id)).toEqual(['g']);
		// The canvas marked another node itself (a click); the editor's choice wins on the next pass.
		const clicked = first.map((n) => ({ ...n, selected: n.id === 'a' }));
		const next = toNodes(base, clicked, true, 'g');
		expect(next.filter((n) => n.selected).map((n) => n.id)).toEqual(['g']);
		expect(toNodes(base, next, true, null).some((n) => n.selected)).toBe(false);
		// Nothing changed: the same objects come back, so the canvas does not redraw.
		expect(toNodes(base, next, true, 'g')).toEqual(next);
		expect(toNodes(base, next, true, 'g')[0]).toBe(next[0]);
	});
});
