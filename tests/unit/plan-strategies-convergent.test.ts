import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import type { RouteDocument } from '../../src/lib/route/document';
import { planRouteDocument } from '../../src/lib/server/services/plan';

// The strategy planner against textbook protecting-group practice. Each case names its source;
// "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed.; "Clayden" is
// Clayden, Greeves & Warren, Organic Chemistry; "Kocienski" is Kocienski, Protecting Groups,
// 3rd ed. — all from memory. Molecules are invented intermediates of the OG-2031 scenario.

describe('strategy cases from textbook practice', () => {
	it('masks the amine of the acid half before a convergent amide coupling, on that branch only — Clayden, N-protection of the acid component in peptide coupling (from memory)', () => {
		const doc: RouteDocument = {
			name: 'OG-2031 coupling',
			intermediates: [
				{ id: 'acid', label: 'OG-2031-F amino acid', structure: 'NCCC(=O)O' },
				{ id: 'amine', label: 'OG-2031-G benzylamine', structure: 'NCc1ccccc1' },
				{ id: 'amide', label: 'OG-2031-H amide', structure: 'NCCC(=O)NCc1ccccc1' }
			],
			steps: [{ id: 'join', from: ['acid', 'amine'], to: 'amide', reagents: 'HATU, DIPEA, DMF' }]
		};
		const answer = planRouteDocument(doc);
		expect(answer.unsolved).toBeUndefined();
		// An amine carbamate or sulfonamide masks it (Boc, Cbz, Teoc, Troc, Alloc …: which one ranks
		// first is the planner's choice among equals, so the first plan is followed here).
		expect(
			answer.plans
				.map((p) => p.protections[0]!.protectingGroup)
				.every((pg) => ['Boc', 'Cbz', 'Fmoc', 'Alloc', 'Teoc', 'Troc', 'Ts', 'Ns'].includes(pg))
		).toBe(true);
		const first = answer.plans[0]!;
		const chosen = first.protections[0]!.protectingGroup;
		expect(first.protections).toEqual([
			expect.objectContaining({
				group: 'amine-primary',
				atoms: [0, 1],
				install: expect.objectContaining({ before: 'join' }),
				removal: expect.objectContaining({ after: 'end' })
			})
		]);
		// The mask goes on the acid half; the coupling joins the protected acid with the untouched amine.
		const protect = first.route.steps.find((st) => st.intent === 'protect')!;
		expect(protect.from).toEqual(['acid']);
		const join = first.route.steps.find((st) => st.id === 'join')!;
		expect(join.from).toEqual([protect.to, 'amine']);
		const masked = first.route.intermediates.find((n) => n.id === protect.to)!;
		expect(perceiveText(masked.structure).protectingGroups).toEqual([
			expect.objectContaining({ id: chosen, masks: 'amine-primary' })
		]);
		expect(first.route.intermediates.find((n) => n.id === 'amine')!.structure).toBe('NCc1ccccc1');
		// Free again at the end: the last step removes the mask and gives the drawn target back.
		const last = first.route.steps.at(-1)!;
		expect(last.intent).toBe('deprotect');
		expect(first.route.intermediates.find((n) => n.id === last.to)!.structure).toBe(
			'NCCC(=O)NCc1ccccc1'
		);
	});

	it("masks a ketone on one branch of a convergent route through that branch's Grignard step — Clayden; Greene's (from memory)", () => {
		const doc: RouteDocument = {
			name: 'OG-2031 convergent',
			intermediates: [
				{ id: 'b0', structure: 'CC(=O)CCC(=O)OC' },
				{ id: 'b1', structure: 'CC(=O)CCC(C)(C)O' },
				{ id: 'a0', structure: 'OC(=O)c1ccccc1' },
				{ id: 'ab', structure: 'CC(=O)CCC(C)(C)OC(=O)c1ccccc1' }
			],
			steps: [
				{ id: 'grignard', from: ['b0'], to: 'b1', reagents: 'MeMgBr, THF' },
				{ id: 'ester', from: ['a0', 'b1'], to: 'ab', reagents: 'DCC, DMAP, CH2Cl2' }
			]
		};
		const answer = planRouteDocument(doc);
		expect(answer.unsolved).toBeUndefined();
		const best = answer.plans[0]!;
		expect(best.protections).toHaveLength(1);
		expect(best.protections[0]).toMatchObject({ group: 'ketone', install: { before: 'grignard' } });
		const protect = best.route.steps.find((st) => st.intent === 'protect')!;
		expect(protect.from).toEqual(['b0']);
	});

	it('says plainly that a route whose intermediate feeds two steps is planned one branch at a time — common practice', () => {
		const doc: RouteDocument = {
			name: 'OG-2031 analogues',
			intermediates: [
				{ id: 'a', structure: 'CC(=O)CCC(=O)OC' },
				{ id: 'b', structure: 'CC(=O)CCC(C)(C)O' },
				{ id: 'c', structure: 'CC(=O)CCC(CC)(CC)O' }
			],
			steps: [
				{ id: 'me', from: ['a'], to: 'b', reagents: 'MeMgBr, THF' },
				{ id: 'et', from: ['a'], to: 'c', reagents: 'EtMgBr, THF' }
			]
		};
		expect(planRouteDocument(doc).unsolved![0]!.reason).toContain(
			'Intermediate "a" is used by two steps ("me" and "et")'
		);
	});
});
