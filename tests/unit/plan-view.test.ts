import { describe, expect, it } from 'vitest';
import { intentLabel, toEdges } from '../../src/lib/components/route-map/flow';
import {
	addedStepsText,
	groupName,
	installPlace,
	protectedStructure,
	protectingGroupName,
	removalPlace,
	stepNames,
	stepOrder
} from '../../src/lib/components/route-map/plan-view';
import type { RouteDocument } from '../../src/lib/route/document';
import type { Plan, Protection } from '../../src/lib/rules/plan';

// The Cormorant keto ester route, drawn out of order the way a canvas can store it: the Grignard
// step was added before the ester hydrolysis that comes earlier in the route.
const route: RouteDocument = {
	name: 'OG-2031',
	intermediates: [
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', structure: 'CC(=O)CCC(C)(C)O' },
		{ id: 'z', structure: 'CC(=O)CCC(=O)O' }
	],
	steps: [
		{
			id: '5d1c0a9e-grignard',
			from: ['a'],
			to: 'b',
			reagents: 'MeMgBr, THF, then aqueous NH4Cl work-up at 0 °C'
		},
		{ id: 'esterify', from: ['z'], to: 'a', reagents: 'MeOH, H2SO4' }
	]
};

const dioxolane: Protection = {
	group: 'ketone',
	atoms: [0, 1, 2, 3],
	intermediate: 'a-dioxolane',
	protectingGroup: 'dioxolane',
	install: {
		before: '5d1c0a9e-grignard',
		reagents: 'ethylene glycol, TsOH, toluene',
		conditions: ['acid-mild']
	},
	removal: { after: 'end', reagents: '1 M HCl, THF', conditions: ['acid-mild'] }
};

describe('plan view', () => {
	it('orders steps along the route and names them by place and reagents, cutting long reagent text', () => {
		expect(stepOrder(route).map((s) => s.id)).toEqual(['esterify', '5d1c0a9e-grignard']);
		const names = stepNames(route);
		expect(names.get('esterify')).toBe('step 1 (MeOH, H2SO4)');
		expect(names.get('5d1c0a9e-grignard')).toBe(
			'step 2 (MeMgBr, THF, then aqueous NH4Cl work-up…)'
		);
		expect(stepNames({ ...route, steps: [{ id: 's', from: ['a'], to: 'b' }] }).get('s')).toBe(
			'step 1'
		);
	});

	it('says where a protecting group goes on and comes off', () => {
		const names = stepNames(route);
		expect(installPlace(dioxolane, names)).toBe(
			'before step 2 (MeMgBr, THF, then aqueous NH4Cl work-up…)'
		);
		expect(removalPlace(dioxolane, names)).toBe('at the end');
		expect(
			removalPlace({ ...dioxolane, removal: { ...dioxolane.removal, after: 'esterify' } }, names)
		).toBe('after step 1 (MeOH, H2SO4)');
		// A step the map no longer has is still named, by its id.
		expect(
			installPlace({ ...dioxolane, install: { ...dioxolane.install, before: 'gone' } }, names)
		).toBe('before step “gone”');
	});

	it('uses the rule table’s labels when they are there and the ids until then', () => {
		const labels = {
			groups: new Map([['ester', 'carboxylic ester']]),
			protectingGroups: new Map([['TBS', 'tert-butyldimethylsilyl ether']])
		};
		expect(groupName('ester', labels)).toBe('carboxylic ester');
		expect(groupName('ester', null)).toBe('ester');
		expect(groupName('route', labels)).toBe('the route');
		expect(protectingGroupName('TBS', labels)).toBe('tert-butyldimethylsilyl ether');
		expect(protectingGroupName('dioxolane', labels)).toBeNull();
		expect([0, 1, 2].map(addedStepsText)).toEqual([
			'No added steps',
			'1 added step',
			'2 added steps'
		]);
	});

	it('finds the first protected intermediate of a protection in the plan’s route', () => {
		const plan: Plan = {
			rank: 1,
			score: 0,
			protections: [dioxolane],
			addedSteps: 2,
			rationale: [],
			route: {
				...route,
				intermediates: [
					...route.intermediates,
					{ id: 'a-dioxolane', structure: 'CC1(CCC(=O)OC)OCCO1' }
				]
			}
		};
		expect(protectedStructure(plan, dioxolane)).toBe('CC1(CCC(=O)OC)OCCO1');
		expect(protectedStructure(plan, { ...dioxolane, intermediate: 'nowhere' })).toBeNull();
	});
});

describe('step edges of the planner', () => {
	it('carry a spoken name for protection and deprotection steps only, and change it with the reagents', () => {
		const doc: RouteDocument = {
			...route,
			steps: [
				{ id: 'on', from: ['z'], to: 'a', reagents: 'ethylene glycol, TsOH', intent: 'protect' },
				{ id: 'off', from: ['a'], to: 'b', intent: 'deprotect' },
				{ id: 'plain', from: ['b'], to: 'z', reagents: 'MeMgBr', intent: 'transform' }
			]
		};
		expect(doc.steps.map(intentLabel)).toEqual([
			'Protection step: ethylene glycol, TsOH',
			'Deprotection step',
			null
		]);
		const edges = toEdges(doc, [], null);
		expect(edges.map((e) => e.ariaLabel)).toEqual([
			'Protection step: ethylene glycol, TsOH',
			'Deprotection step',
			undefined
		]);
		const renamed = {
			...doc,
			steps: [{ ...doc.steps[0]!, reagents: '2,2-dimethoxypropane, CSA' }, ...doc.steps.slice(1)]
		};
		const again = toEdges(renamed, edges, null);
		expect(again[0]!.ariaLabel).toBe('Protection step: 2,2-dimethoxypropane, CSA');
		expect(again[1]).toBe(edges[1]);
	});
});
