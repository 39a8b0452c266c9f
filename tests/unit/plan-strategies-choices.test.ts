import { describe, expect, it } from 'vitest';
import type { RouteDocument } from '../../src/lib/route/document';
import { planRoute } from '../../src/lib/rules/plan';
import { scoreOf } from '../../src/lib/rules/plan/cost';
import { firstClash, planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// The strategy planner against textbook protecting-group practice. Each case names its source;
// "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed.; "Clayden" is
// Clayden, Greeves & Warren, Organic Chemistry; "Kocienski" is Kocienski, Protecting Groups,
// 3rd ed. — all from memory. Molecules are invented intermediates of the OG-2031 scenario.

const pgsOf = (answer: ReturnType<typeof planRouteDocument>) =>
	answer.plans.map((p) => p.protections.map((x) => x.protectingGroup).join('+'));

describe('strategy cases from textbook practice', () => {
	it("counts THP's new stereocentre as a drawback on a chiral substrate only — Greene's, THP ethers of chiral alcohols are diastereomer mixtures (from memory)", () => {
		const note = 'THP puts a new stereocentre at its acetal carbon';
		const thp = (answer: ReturnType<typeof planRoute>) =>
			answer.plans.find((p) => p.protections[0]!.protectingGroup === 'THP')!;
		const chiral = planRoute(line(['C[C@H](O)CCC(=O)OC', 'C[C@H](O)CCC(C)(C)O'], ['MeMgBr, THF']), {
			verify: firstClash,
			plans: 20
		});
		const achiral = planRoute(line(['OCCCCC(=O)OC', 'OCCCCC(C)(C)O'], ['MeMgBr, THF']), {
			verify: firstClash,
			plans: 20
		});
		expect(thp(chiral).rationale[0]).toContain(note);
		expect(thp(achiral).rationale[0]).not.toContain(note);
		// One drawback more than on the achiral alcohol (a tier above any caution), so a silyl ether ranks above THP there.
		expect(thp(chiral).score - thp(achiral).score).toBe(
			scoreOf({ addedSteps: 0, drawbacks: 1, cautions: 0, preference: 0, harshness: 0 })
		);
		expect(chiral.plans[0]!.protections[0]!.protectingGroup).not.toBe('THP');
	});

	it('does not silylate an alcohol beside the free amine a coupling needs — Clayden, amines react with silyl and acyl chlorides faster than alcohols (from memory)', () => {
		const doc: RouteDocument = {
			name: 'OG-2044 coupling',
			intermediates: [
				{ id: 'acid', structure: 'CCC(C)C(=O)O' },
				{ id: 'amine', structure: 'NC[C@H](O)CC' },
				{ id: 'amide', structure: 'CCC(C)C(=O)NC[C@H](O)CC' }
			],
			// A Steglich coupling: with DMAP the carbodiimide acylates the alcohol too.
			steps: [{ id: 'couple', from: ['acid', 'amine'], to: 'amide', reagents: 'EDC, DMAP, CH2Cl2' }]
		};
		const answer = planRouteDocument(doc);
		expect(answer.plans.length).toBeGreaterThan(0);
		for (const plan of answer.plans) {
			expect(['TMS', 'TES', 'TBS', 'TIPS', 'TBDPS']).not.toContain(
				plan.protections[0]!.protectingGroup
			);
		}
		expect(answer.plans[0]!.rationale.join(' ')).toMatch(
			/TBS rejected: installing it \(TBSCl, imidazole, DMF\) would also attack the free primary alkylamine/
		);
	});

	it("says why the usual cyclic acetal is not used when the diol's acetonide goes on later under acid — Greene's, acetals exchange under acid catalysis (from memory)", () => {
		const answer = planRouteDocument(
			line(
				[
					'OC[C@@H](O)CC(=O)CCC(=O)OC',
					'OC[C@@H](O)CC(=O)CCC=O',
					'OC[C@@H](O)CC(=O)CC/C=C/C(=O)OCC'
				],
				['DIBAL-H, CH2Cl2, –78 °C', '(EtO)2P(O)CH2CO2Et, NaH, THF']
			)
		);
		// Plan 1 keeps the usual dioxolane and gives the diol a silylene, which goes on without acid;
		// the acetonide comes with a dithiane (removed with MeI, a carcinogen) further down.
		const best = answer.plans[0]!;
		expect(best.protections.map((p) => `${p.protectingGroup}:${p.group}`)).toEqual([
			'dioxolane:ketone',
			'DTBS:diol-1,2'
		]);
		expect(best.rationale).toContain(
			'acetonide not used for the 1,2-diol: putting the acetonide on (2,2-dimethoxypropane, PPTS, acetone) would strip the dioxolane on the ketone.'
		);
		const acetonide = answer.plans.find((p) =>
			p.protections.some((x) => x.protectingGroup === 'acetonide')
		)!;
		expect(acetonide.protections.map((p) => p.protectingGroup)).toEqual(['dithiane', 'acetonide']);
		expect(acetonide.rationale).toContain(
			'dioxolane not used for the ketone: putting the acetonide on (2,2-dimethoxypropane, PPTS, acetone) would strip the dioxolane on the ketone.'
		);
	});

	it('masks nothing for an amide coupling beside a free alcohol — Montalbetti & Falque, Tetrahedron 2005, 61, 10827: HATU acylates the amine, not the alcohol (from memory)', () => {
		const doc: RouteDocument = {
			name: 'OG-2045 coupling',
			intermediates: [
				{ id: 'acid', structure: 'CCC(C)C(=O)O' },
				{ id: 'amine', structure: 'NC[C@H](O)CC' },
				{ id: 'amide', structure: 'CCC(C)C(=O)NC[C@H](O)CC' }
			],
			steps: [{ id: 'couple', from: ['acid', 'amine'], to: 'amide', reagents: 'HATU, DIPEA, DMF' }]
		};
		expect(planRouteDocument(doc).plans[0]).toMatchObject({ addedSteps: 0, protections: [] });
	});

	it('adds nothing when no step attacks a bystander — common practice (a Swern oxidation of a lone alcohol)', () => {
		const answer = planRouteDocument(line(['CCCCO', 'CCCC=O'], ['(COCl)2, DMSO, Et3N']));
		expect(answer.plans).toHaveLength(1);
		expect(answer.plans[0]).toMatchObject({ rank: 1, addedSteps: 0, protections: [] });
	});

	it('ranks plans by added steps, then cautions, then harshness, and returns at most five — common practice', () => {
		const answer = planRouteDocument(line(['OCCCCC(C)=O', 'OCCCCC(C)(C)O'], ['MeMgBr, THF']));
		expect(answer.plans.length).toBeLessThanOrEqual(5);
		expect(answer.plans.map((p) => p.rank)).toEqual(answer.plans.map((_, i) => i + 1));
		const scores = answer.plans.map((p) => p.score);
		expect([...scores].sort((a, b) => a - b)).toEqual(scores);
		// Each plan is a different choice of protecting group, not the same PG taken off another way.
		expect(new Set(pgsOf(answer)).size).toBe(answer.plans.length);
	});

	it("masks two ketones in one ketalisation and frees them in one hydrolysis — Greene's, acetals form and hydrolyse under the same acid catalysis (from memory)", () => {
		// An ester, not an aldehyde, is what the Grignard reagent attacks: beside a free aldehyde no
		// ketone can be ketalised (the aldehyde takes the diol first; tests/unit/plan-judgement.test.ts).
		const answer = planRouteDocument(
			line(['CC(=O)CCC(CC(=O)OC)CCC(C)=O', 'CC(=O)CCC(CC(C)(C)O)CCC(C)=O'], ['MeMgBr, THF'])
		);
		const best = answer.plans[0]!;
		expect(best.protections).toHaveLength(2);
		expect(best.protections[0]!.protectingGroup).toBe(best.protections[1]!.protectingGroup);
		expect(best.protections[0]!.intermediate).toBe(best.protections[1]!.intermediate);
		expect(best.addedSteps).toBe(2);
		expect(best.rationale.join(' ')).toContain('on 2 groups of the same kind at once');
	});
});
