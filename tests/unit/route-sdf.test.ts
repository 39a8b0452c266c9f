import { describe, expect, it } from 'vitest';
import { canonicalForm, readStructure, splitSdf } from '../../src/lib/chem';
import {
	routeFromJson,
	routeFromSdf,
	RouteFileError,
	routeOrder,
	routeToSdf
} from '../../src/lib/server/route-sdf';
import type { RouteDocument } from '../../src/lib/route/document';

// An invented route: the fictional keto ester OG-2031-A is protected, then sits out a Grignard.
const linear: RouteDocument = {
	name: 'OG-2031 side chain',
	intermediates: [
		{ id: 'a', label: 'OG-2031-A', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', label: 'OG-2031-B (dioxolane)', structure: 'CC1(CCC(=O)OC)OCCO1' },
		{ id: 'c', structure: 'CC1(CCC(C)(C)O)OCCO1' }
	],
	steps: [
		{
			id: 's1',
			from: ['a'],
			to: 'b',
			reagents: 'ethylene glycol, TsOH, toluene, reflux',
			conditions: ['acid-mild', 'heat'],
			intent: 'protect'
		},
		{
			id: 's2',
			from: ['b'],
			to: 'c',
			reagents: 'MeMgBr, THF',
			notes: 'Two equivalents.\n\nQuench cold.'
		}
	]
};

const key = (structure: string) =>
	canonicalForm(readStructure(structure, { coordinates: true }).molecule).key;

describe('route SDF export', () => {
	it('writes one record per intermediate in route order, with the incoming step as data fields', () => {
		const records = splitSdf(routeToSdf(linear));
		expect(records.map((r) => r.fields.id)).toEqual(['a', 'b', 'c']);
		expect(records[0]!.fields).toEqual({ id: 'a', label: 'OG-2031-A' });
		expect(records[1]!.fields).toMatchObject({
			step: 's1',
			from: 'a',
			reagents: 'ethylene glycol, TsOH, toluene, reflux',
			conditions: 'acid-mild, heat',
			intent: 'protect'
		});
		expect(records[2]!.fields.notes).toBe('Two equivalents.\nQuench cold.');
		expect(records[1]!.molfile.split('\n')[0]).toBe('OG-2031-B (dioxolane)');
	});

	it('puts every step’s inputs before its product, whatever the document order', () => {
		const shuffled = {
			...linear,
			intermediates: [linear.intermediates[2]!, linear.intermediates[0]!, linear.intermediates[1]!]
		};
		expect(routeOrder(shuffled).map((n) => n.id)).toEqual(['a', 'b', 'c']);
	});
});

describe('route SDF import', () => {
	it('round-trips a linear route: ids, labels, steps, reagents, conditions and the molecules', () => {
		const back = routeFromSdf(routeToSdf(linear), 'Imported');
		expect(back.name).toBe('Imported');
		expect(back.intermediates.map(({ id, label }) => ({ id, label }))).toEqual([
			{ id: 'a', label: 'OG-2031-A' },
			{ id: 'b', label: 'OG-2031-B (dioxolane)' },
			{ id: 'c', label: undefined }
		]);
		back.intermediates.forEach((node, i) =>
			expect(key(node.structure)).toBe(key(linear.intermediates[i]!.structure))
		);
		expect(back.steps).toEqual([
			{ ...linear.steps[0] },
			{ ...linear.steps[1], notes: 'Two equivalents.\nQuench cold.' }
		]);
	});

	it('keeps a convergent step through its `from` field', () => {
		const convergent: RouteDocument = {
			name: 'Convergent',
			intermediates: [
				{ id: 'x', structure: 'OCCO' },
				{ id: 'y', structure: 'CC(=O)CCC(=O)OC' },
				{ id: 'z', structure: 'CC1(CCC(=O)OC)OCCO1' }
			],
			steps: [{ id: 'join', from: ['x', 'y'], to: 'z', reagents: 'TsOH, toluene' }]
		};
		expect(routeFromSdf(routeToSdf(convergent), 'C').steps).toEqual(convergent.steps);
	});

	it('joins records without fields by consecutive steps with generated ids', () => {
		const plain = routeToSdf(linear).replace(/^> {2}<[^>]+>\n[^\n]*\n\n/gm, '');
		const back = routeFromSdf(plain, 'Plain');
		expect(back.intermediates.map((n) => n.id)).toEqual(['i1', 'i2', 'i3']);
		expect(back.steps.map(({ id, from, to }) => ({ id, from, to }))).toEqual([
			{ id: 's1', from: ['i1'], to: 'i2' },
			{ id: 's2', from: ['i2'], to: 'i3' }
		]);
	});

	it('names the record and the reason when a record cannot be read', () => {
		const records = routeToSdf(linear).split('$$$$\n');
		const broken = [
			records[0],
			records[1]!.replace(/^(.{3}).*V2000$/m, '$1 garbage'),
			records[2]
		].join('$$$$\n');
		expect(() => routeFromSdf(broken, 'Broken')).toThrowError(
			/^Record 2 \(“b”\) cannot be read: .*counts line/
		);
		try {
			routeFromSdf(broken, 'Broken');
		} catch (caught) {
			expect(caught).toBeInstanceOf(RouteFileError);
			expect((caught as RouteFileError).record).toBe(2);
		}
	});

	it('refuses duplicate ids and `from` ids that no earlier record has', () => {
		const sdf = routeToSdf(linear);
		expect(() => routeFromSdf(sdf.replace('>  <id>\nc\n', '>  <id>\na\n'), 'Dup')).toThrowError(
			'Record 3 uses the id “a”, which record 1 already has.'
		);
		expect(() => routeFromSdf(sdf.replace('>  <from>\nb\n', '>  <from>\nq\n'), 'Bad')).toThrowError(
			/^Record 3 \(“c”\) starts from “q”/
		);
	});
});

describe('route JSON import', () => {
	it('accepts a bare document or a GET /api/routes answer, and names an unreadable structure', () => {
		expect(routeFromJson(JSON.stringify(linear), 'x')).toEqual(linear);
		expect(routeFromJson(JSON.stringify({ id: 'r', document: linear }), 'x').name).toBe(
			linear.name
		);
		const bad = {
			...linear,
			intermediates: [...linear.intermediates.slice(0, 2), { id: 'c', structure: 'C1CC' }]
		};
		expect(() => routeFromJson(JSON.stringify(bad), 'x')).toThrowError(
			/^Intermediate 3 \(“c”\) cannot be read: .*ring/
		);
		expect(() => routeFromJson('{ nope', 'x')).toThrowError('The file is not valid JSON.');
		expect(() =>
			routeFromJson(JSON.stringify({ ...linear, steps: [{ id: 's', from: ['a'], to: 'zz' }] }), 'x')
		).toThrowError(/unknown intermediate "zz"/);
	});
});
