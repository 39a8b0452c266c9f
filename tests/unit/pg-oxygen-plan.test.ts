import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// The planner with the oxygen PGs of issue 11 in the table. "Greene's" is Wuts, Greene's
// Protective Groups in Organic Synthesis, 5th ed., ch. 2 — from memory. Invented intermediates.

describe('planning with the new diol masks', () => {
	it("masks a 1,2-diol as a cyclic carbonate through a Jones oxidation, where acid-labile acetals fail — Greene's, cyclic carbonates are stable to acid (from memory)", () => {
		const answer = planRouteDocument(
			line(['O=CCCCC[C@@H](O)CO', 'OC(=O)CCCC[C@@H](O)CO'], ['Jones reagent, acetone'])
		);
		expect(answer.unsolved).toBeUndefined();
		const best = answer.plans[0]!;
		expect(best.protections.map((p) => p.protectingGroup)).toEqual(['cyclic-carbonate']);
		expect(best.cautions).toEqual([]);
		expect(best.rationale.join(' ')).toMatch(/acetonide rejected: the strong acid conditions/);
		expect(best.rationale.join(' ')).toMatch(/PMP-acetal rejected/);
		// The drawn intermediate carries the carbonate the planner chose.
		const masked = best.route.intermediates.find(
			(n) => n.id === best.protections[0]!.intermediate
		)!;
		expect(perceiveText(masked.structure).protectingGroups.map((pg) => pg.id)).toEqual([
			'cyclic-carbonate'
		]);
	});
});
