import { describe, expect, it } from 'vitest';
import { perceiveText } from '../../src/lib/chem';
import { planRoute } from '../../src/lib/rules/plan';
import { firstClash, planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// The strategy planner against textbook protecting-group practice. Each case names its source;
// "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed.; "Clayden" is
// Clayden, Greeves & Warren, Organic Chemistry; "Kocienski" is Kocienski, Protecting Groups,
// 3rd ed. — all from memory. Molecules are invented intermediates of the OG-2031 scenario.

const pgsOf = (answer: ReturnType<typeof planRouteDocument>) =>
	answer.plans.map((p) => p.protections.map((x) => x.protectingGroup).join('+'));

describe('strategy cases from textbook practice', () => {
	it("masks a ketone as a cyclic acetal through a Grignard addition to the ester — Clayden; Greene's (from memory)", () => {
		const answer = planRouteDocument(
			line(['CC(=O)CCC(=O)OC', 'CC(=O)CCC(C)(C)O'], ['MeMgBr, THF'])
		);
		expect(answer.unsolved).toBeUndefined();
		expect(pgsOf(answer)).toContain('dioxolane');
		expect(
			answer.plans.every((p) =>
				['dioxolane', 'dioxane', 'dimethyl-acetal', 'dithiane'].includes(
					p.protections[0]!.protectingGroup
				)
			)
		).toBe(true);
		const dioxolane = answer.plans.find((p) => p.protections[0]!.protectingGroup === 'dioxolane')!;
		expect(dioxolane.protections[0]).toMatchObject({
			group: 'ketone',
			install: { before: 's1' },
			removal: { after: 'end' }
		});
		expect(dioxolane.addedSteps).toBe(2);
		const masked = dioxolane.route.intermediates.find(
			(n) => n.id === dioxolane.protections[0]!.intermediate
		)!;
		expect(perceiveText(masked.structure).protectingGroups.map((pg) => pg.id)).toContain(
			'dioxolane'
		);
		// The free ketone comes back at the end: the last intermediate is the original product.
		expect(dioxolane.route.intermediates.at(-1)!.structure).toBe('CC(=O)CCC(C)(C)O');
		// Labels say which PGs a drawn intermediate carries; the freed product keeps the plain name.
		expect(dioxolane.route.intermediates.map((n) => n.label)).toEqual([
			'i0',
			'i0 (with dioxolane)',
			'i1 (with dioxolane)',
			'i1'
		]);
	});

	it("keeps a 1,2-diol as an acetonide through a hydrogenation, not as a benzylidene acetal — Greene's, benzylidene acetals fall to hydrogenolysis (from memory)", () => {
		// The diol is attacked before the hydrogenation (Swern) and after it (Grignard), so its mask must sit through it.
		const answer = planRouteDocument(
			line(
				['OCC(O)CC=CCCO', 'OCC(O)CC=CCC=O', 'OCC(O)CCCCC=O', 'OCC(O)CCCCC(C)O'],
				['(COCl)2, DMSO, Et3N', 'H2, Pd/C, EtOH', 'MeMgBr, THF']
			)
		);
		expect(answer.plans.length).toBeGreaterThan(0);
		expect(
			answer.plans.every(
				(p) => p.protections.find((x) => x.group === 'diol-1,2')!.protectingGroup === 'acetonide'
			)
		).toBe(true);
		expect(answer.plans[0]!.rationale.join(' ')).toMatch(
			/benzylidene rejected: .*hydrogenation.*"s2"/
		);
	});

	it("takes a benzylidene acetal off before a hydrogenation that the diol itself can stand — Greene's, benzylidene acetals fall to hydrogenolysis (from memory)", () => {
		const answer = planRouteDocument(
			line(
				['OCC(O)CC=CCCO', 'OCC(O)CC=CCC=O', 'OCC(O)CCCCC=O'],
				['(COCl)2, DMSO, Et3N', 'H2, Pd/C, EtOH']
			)
		);
		expect(pgsOf(answer)[0]).toBe('acetonide');
		const benzylidene = answer.plans.find(
			(p) => p.protections[0]!.protectingGroup === 'benzylidene'
		)!;
		expect(benzylidene.protections[0]!.removal.after).toBe('s1');
		expect(benzylidene.rationale[0]).toContain(
			'after step "s1" ((COCl)2, DMSO, Et3N), as soon as nothing attacks it'
		);
		// Its removal step runs before the hydrogenation.
		const order = benzylidene.route.steps.map((st) => st.intent ?? st.id);
		expect(order.indexOf('deprotect')).toBeLessThan(order.indexOf('s2'));
	});

	it("takes a benzyl ether off by hydrogenolysis before the alkene is made, not at the end — Greene's, hydrogenolysis of benzyl ethers also reduces alkenes (from memory)", () => {
		// The Grignard reagent adds twice to the ester; acid then dehydrates the tertiary alcohol to the alkene.
		// Bn is a harsh choice here (NaH to put it on), so ask for every plan, not the best five.
		const answer = planRoute(
			line(
				['OCCCCC(=O)OC', 'OCCCCC(C)(C)O', 'OCCCCC(C)=C'],
				['MeMgBr, THF', 'TsOH, toluene, reflux']
			),
			{ verify: firstClash, plans: 20 }
		);
		const bn = answer.plans.find((p) => p.protections[0]!.protectingGroup === 'Bn')!;
		expect(bn.protections[0]!.removal).toMatchObject({
			after: 's1',
			conditions: ['hydrogenation']
		});
		expect(bn.rationale[0]).toContain(
			'off after step "s1" (MeMgBr, THF), as soon as nothing attacks it'
		);
		expect(bn.rationale.join(' ')).not.toContain('Bn rejected');
	});

	it('gives two amines orthogonal PGs that come off at different points — Kocienski, orthogonal amine protection (from memory)', () => {
		const answer = planRouteDocument(
			line(
				[
					'NCCC(CC(=O)O)CCN=[N+]=[N-]',
					'NCCC(CC(=O)OC)CCN=[N+]=[N-]',
					'NCCC(CC(=O)OC)CCN',
					'CC(=O)NCCC(CC(=O)OC)CCN',
					'CC(=O)NCCC(CC(=O)OC)CCNC(=O)c1ccccc1'
				],
				['MeI, K2CO3, DMF', 'PPh3, THF, H2O', 'Ac2O, pyridine', 'BzCl, Et3N, CH2Cl2']
			)
		);
		expect(answer.plans.length).toBeGreaterThan(0);
		for (const plan of answer.plans) {
			const [first, second] = plan.protections;
			expect(first!.protectingGroup).not.toBe(second!.protectingGroup);
			expect([first!.removal.after, second!.removal.after]).toEqual(['s2', 's3']);
			expect(plan.addedSteps).toBe(4);
		}
	});

	it("finds no plan for a terminal alkyne that Grignard steps attack on both sides of a fluoride step — Greene's, TMS alkynes are cleaved by fluoride (from memory)", () => {
		const answer = planRouteDocument(
			line(
				[
					'C#CCCC(C=O)CCO[Si](C)(C)C(C)(C)C',
					'C#CCCC(C(C)O)CCO[Si](C)(C)C(C)(C)C',
					'C#CCCC(C(C)O)CCO',
					'C#CCCC(C(C)O)CC=O',
					'C#CCCC(C(C)O)CC(C)O'
				],
				['MeMgBr, THF', 'TBAF, THF', '(COCl)2, DMSO, Et3N', 'MeMgBr, THF']
			)
		);
		expect(answer.plans).toEqual([]);
		expect(answer.unsolved).toContainEqual({
			group: 'alkyne-terminal',
			atoms: [0, 1],
			reason: expect.stringContaining('Step "s2" (TBAF, THF) makes it impossible')
		});
	});

	it('finds no plan when a Grignard reagent meets a methyl ester the step keeps — Clayden, esters react with Grignard reagents (from memory)', () => {
		const answer = planRouteDocument(
			line(['CC(=O)CCC(=O)OC', 'CC(O)(C)CCC(=O)OC'], ['MeMgBr, THF'])
		);
		expect(answer.plans).toEqual([]);
		expect(answer.unsolved![0]!.reason).toMatch(/methyl-ester.*step "s1"|step "s1".*methyl-ester/);
	});

	it('masks an alcohol from a Grignard reagent as an ether, never as an acetate — Clayden, esters are attacked by organometallics (from memory)', () => {
		const answer = planRouteDocument(line(['OCCCCC(C)=O', 'OCCCCC(C)(C)O'], ['MeMgBr, THF']));
		const used = pgsOf(answer);
		expect(used.some((pg) => ['TES', 'TBS', 'THP', 'TIPS', 'TBDPS'].includes(pg))).toBe(true);
		expect(used).not.toContain('Ac');
		expect(answer.plans[0]!.rationale.join(' ')).toContain(
			'Ac rejected: the grignard reagent conditions of step "s1"'
		);
	});

	it("rejects Cbz for an amine that must stay masked through a hydrogenation, and offers Boc — Greene's, Cbz is cleaved by H2/Pd-C, Boc is not (from memory)", () => {
		// The amine is attacked before the hydrogenation (MeI) and after it (Ac2O).
		const answer = planRouteDocument(
			line(
				[
					'NCCC=CCC(=O)O',
					'NCCC=CCC(=O)OC',
					'NCCCCCC(=O)OC',
					'NCCCCCC(O)(C)C',
					'NCCCCCC(OC(C)=O)(C)C'
				],
				['MeI, K2CO3, DMF', 'H2, Pd/C, EtOH', 'MeMgBr, THF', 'Ac2O, DMAP, CH2Cl2']
			)
		);
		expect(pgsOf(answer)).toContain('Boc');
		expect(pgsOf(answer)).not.toContain('Cbz');
		expect(answer.plans[0]!.rationale.join(' ')).toMatch(
			/Cbz rejected: the catalytic hydrogenation conditions of step "s2"/
		);
	});

	it("masks a thiol as a trityl thioether through a Swern oxidation — Greene's, S-trityl protection of thiols (from memory)", () => {
		const answer = planRouteDocument(line(['SCCCCO', 'SCCCC=O'], ['(COCl)2, DMSO, Et3N']));
		expect(new Set(pgsOf(answer))).toEqual(new Set(['S-Tr']));
	});

	it("does not benzylate a phenol with NaH while a ketone is free, but by a recipe without strong base — common practice, NaH enolises ketones; Greene's, Ag2O/BnBr benzylation (from memory)", () => {
		const answer = planRouteDocument(
			line(['Oc1ccc(CC(C)=O)cc1', 'Oc1ccc(CC(C)(O)C)cc1'], ['MeMgBr, THF'])
		);
		const benzyl = answer.plans
			.flatMap((p) => p.protections)
			.filter((x) => x.protectingGroup === 'Bn');
		expect(benzyl.length).toBeGreaterThan(0);
		for (const bn of benzyl) {
			expect(bn.install.reagents).not.toMatch(/NaH/);
		}
	});

	it('carries a carboxylic acid through a Grignard step only as the hindered tBu ester, with cautions — Clayden, esters are attacked by organometallics; Lundt et al. 1978, tertiary alcohols survive TFA/CH2Cl2 (from memory)', () => {
		const answer = planRouteDocument(
			line(['OC(=O)CCCC(C)=O', 'OC(=O)CCCC(C)(C)O'], ['MeMgBr, THF'])
		);
		// Methyl, benzyl and allyl esters are attacked by the Grignard reagent; the tBu ester only
		// calls for care. TFA in CH2Cl2 leaves the aliphatic tertiary alcohol made in the step: the
		// planner's removal step is judged by its reagent, as a chemist's own TFA step would be.
		expect(new Set(pgsOf(answer))).toEqual(new Set(['tBu-ester']));
		const cautions = answer.plans[0]!.cautions.map((c) => c.message).join(' ');
		expect(cautions).toMatch(/MeMgBr \(Grignard reagent\) may partly remove the tBu-ester group/);
		expect(cautions).not.toMatch(/TFA \(Strong acid\) may attack the free tertiary alcohol/);
		expect(answer.plans[0]!.rationale.join(' ')).toContain('methyl-ester rejected');
	});
});
