import { describe, expect, it } from 'vitest';
import type { RouteDocument } from '../../src/lib/route/document';
import { stepLabeller } from '../../src/lib/route/step-names';
import { planRouteDocument } from '../../src/lib/server/services/plan';

// How prose names a step: the chemist's own id when it reads well, the step's place in the route
// when the id is a canvas UUID, with the reagents either way. Invented OG-2031 intermediates.
const route = (grignardId: string): RouteDocument => ({
	name: 'OG-2031',
	intermediates: [
		{ id: 'z', structure: 'CC(=O)CCC(=O)O' },
		{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
		{ id: 'b', structure: 'CC(=O)CCC(C)(C)O' }
	],
	steps: [
		{ id: grignardId, from: ['a'], to: 'b', reagents: 'MeMgBr, THF' },
		{ id: 'esterify', from: ['z'], to: 'a', reagents: 'MeOH, H2SO4' }
	]
});

describe('step names in prose', () => {
	it('uses a readable id, or the place in the route for a UUID, with the reagents', () => {
		expect(stepLabeller(route('grignard'))('grignard')).toBe('step "grignard" (MeMgBr, THF)');
		const uuid = '0b5c3e2a-6f1d-4c1e-9a7b-2d8e4f6a1c3b';
		expect(stepLabeller(route(uuid))(uuid)).toBe('step 2 (MeMgBr, THF)');
	});

	it("names canvas steps by place in the planner's rationale — common practice (a ketone through a Grignard step)", () => {
		const uuid = '0b5c3e2a-6f1d-4c1e-9a7b-2d8e4f6a1c3b';
		const text = planRouteDocument(route(uuid)).plans[0]!.rationale.join(' ');
		expect(text).toContain('through step 2 (MeMgBr, THF)');
		expect(text).not.toContain(uuid);
	});
});
