import { describe, expect, it } from 'vitest';
import { checkStep } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { transformation } from '../../src/lib/rules/check/transformation';

// A step that converts one of two groups that are the same site by symmetry (one alcohol of a
// symmetric diol) asks a question of selectivity, not a clash: McDougal, Rico, Oh & Condon,
// J. Org. Chem. 1986, 51, 3388 (mono-silylation of symmetric diols) — from memory: the chemist
// sets the sites apart with the amounts or an excess of the cheap diol. Two groups of one id that
// are not symmetry-equivalent keep the table's verdict, and so does a PG: taking one of two
// equivalent TBS ethers off stays a clash (check-textbook.test.ts), since the product is a
// statistical mixture of the precious intermediate.

const rules = checkRulesFrom();
const TBS_ON = 'TBSCl, imidazole, DMF';

describe('symmetry-equivalent free groups', () => {
	it('marks the other alcohol of butane-1,4-diol as the twin of the one silylated', () => {
		const change = transformation(['OCCCCO'], 'CC(C)(C)[Si](C)(C)OCCCCO');
		const alcohols = change.freeGroups.filter((g) => g.id === 'alcohol-primary');
		expect(alcohols.map((g) => [g.survives, g.twinOfConverted ?? false]).sort()).toEqual([
			[false, false],
			[true, true]
		]);
	});

	it('cautions, and says why, instead of a clash', () => {
		const answer = checkStep(rules, {
			id: 's1',
			substrate: 'OCCCCO',
			product: 'CC(C)(C)[Si](C)(C)OCCCCO',
			reagents: TBS_ON
		});
		expect(answer.clashes.map((c) => [c.subject, c.severity])).toEqual([
			['alcohol-primary', 'caution']
		]);
		expect(answer.clashes[0]!.message).toContain(
			'the other free primary alcohol, which this step leaves alone, is the same site by symmetry'
		);
	});

	it('keeps the clash when the two primary alcohols differ (a neopentyl one stands by)', () => {
		// 2,2-dimethylpentane-1,5-diol: silylating the unhindered end leaves a neopentyl alcohol
		// that TBSCl still silylates (Greene's, 5th ed., ch. 2 — from memory); not the same site.
		const answer = checkStep(rules, {
			id: 's1',
			substrate: 'OCCCC(C)(C)CO',
			product: 'CC(C)(C)[Si](C)(C)OCCCC(C)(C)CO',
			reagents: TBS_ON
		});
		expect(answer.clashes.find((c) => c.subject === 'alcohol-primary')?.severity).toBe('clash');
	});
});
