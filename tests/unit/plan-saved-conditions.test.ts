import { describe, expect, it } from 'vitest';
import { planRoute, type Plan, type SavedConditionEntry } from '../../src/lib/rules/plan';
import { firstClash, planRouteDocument } from '../../src/lib/server/services/plan';
import { line } from '../factories/plan-routes';

// The planner follows the team's approved saved conditions (issue 16). Chemistry sources, from
// memory: "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis, 5th ed.;
// "Kocienski" is Kocienski, Protecting Groups, 3rd ed.; "Corey 1981" is Corey, Cho, Rücker &
// Hua, Tetrahedron Lett. 1981, 22, 3455 (TBSOTf with 2,6-lutidine). Molecules are invented
// intermediates of the OG-2031 scenario.

// A primary alcohol stands by a Grignard addition to the methyl ester: every plan masks it, and
// plan 1 is TBS (Greene's: TBS ethers stand Grignard reagents; esters do not stop them).
const alcoholByGrignard = () => line(['OCCCC(=O)OC', 'OCCCC(C)(C)O'], ['MeMgBr, THF']);
// The same with a TBDPS ether the chemist already put on: TBAF would strip it, so TBS comes off
// with mild acid instead (Greene's, Kocienski: TBS ethers are cleaved by PPTS/MeOH or AcOH/THF/H2O
// while TBDPS ethers, about 100× more acid-stable, stay; TBAF cleaves both).
const beside = 'CO[Si](c1ccccc1)(c1ccccc1)C(C)(C)C';
const alcoholBesideTbdps = () =>
	line([`OCCC(${beside})CC(=O)OC`, `OCCC(${beside})CC(C)(C)O`], ['MeMgBr, THF']);

let serial = 0;
/** An approved entry of the team's library as the server passes it. */
const entry = (fields: Partial<SavedConditionEntry>): SavedConditionEntry => ({
	id: `00000000-0000-4000-8000-${String(++serial).padStart(12, '0')}`,
	protectingGroup: 'TBS',
	kind: 'install',
	reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C',
	yield: null,
	reference: null,
	scale: null,
	notes: null,
	uses: 0,
	...fields
});

const plan = (doc = alcoholByGrignard(), savedConditions: SavedConditionEntry[] = []) =>
	planRoute(doc, { verify: firstClash, savedConditions });
const added = (p: Plan, intent: 'protect' | 'deprotect') =>
	p.route.steps.find((s) => s.intent === intent)!;
const withPg = (plans: Plan[], pg: string) =>
	plans.find((p) => p.protections[0]?.protectingGroup === pg)!;

describe('the planner and the team’s saved conditions', () => {
	it('writes the team’s approved TBS install into the added step, links it and names it in the rationale — Corey 1981: TBSOTf, 2,6-lutidine silylates primary alcohols', () => {
		const tbsotf = entry({ yield: 94, scale: '2 g', reference: 'NB-OG-112 p. 14', uses: 3 });
		const answer = plan(alcoholByGrignard(), [tbsotf]);
		const first = answer.plans[0]!;
		expect(first.protections[0]!.protectingGroup).toBe('TBS');
		expect(added(first, 'protect')).toMatchObject({
			reagents: 'TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C',
			savedCondition: tbsotf.id
		});
		// The classes written are the ones the classifier reads in the entry (TBSOTf: a silyl
		// triflate, a Lewis acid; 2,6-lutidine: an amine base).
		expect(added(first, 'protect').conditions).toEqual(
			expect.arrayContaining(['lewis-acid', 'base-amine'])
		);
		expect(first.protections[0]!.install).toMatchObject({
			reagents: tbsotf.reagents,
			savedCondition: tbsotf.id
		});
		// No removal entry: the textbook removal stays, unlinked.
		expect(added(first, 'deprotect').reagents).toBe('TBAF, THF');
		expect(added(first, 'deprotect').savedCondition).toBeUndefined();
		const rationale = first.rationale.join('\n');
		expect(rationale).toContain(
			"TBS on: the team's saved condition (TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C), 94 % on 2 g, ref. NB-OG-112 p. 14, followed by 3 steps of the team's routes, instead of the textbook recipe (TBSCl, imidazole, DMF)."
		);
		expect(rationale).toContain('on with TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C, off at the end');
		// The route as written re-checks clean.
		expect(firstClash(first.route)).toBeNull();
	});

	it('leaves every plan as it was when the team has no entry for the PGs it uses', () => {
		const plain = plan();
		const other = plan(alcoholByGrignard(), [entry({ protectingGroup: 'PMB', kind: 'remove' })]);
		const tbs = (answer: ReturnType<typeof plan>) => withPg(answer.plans, 'TBS');
		expect(tbs(other).route).toEqual(tbs(plain).route);
		expect(tbs(other).rationale).toEqual(tbs(plain).rationale);
	});

	it('of several entries for one PG and kind, follows the most used, then the highest yield', () => {
		const often = entry({ reagents: 'TBSCl, imidazole, CH2Cl2', yield: 80, uses: 5 });
		const best = entry({ yield: 97, uses: 1 });
		const rare = entry({ reagents: 'TBSCl, Et3N, DMAP, CH2Cl2', yield: 99, uses: 0 });
		const byUses = plan(alcoholByGrignard(), [best, rare, often]).plans[0]!;
		expect(added(byUses, 'protect').savedCondition).toBe(often.id);
		expect(byUses.rationale.join(' ')).toContain(
			'It is chosen over 2 other approved entries for TBS on by uses, then yield.'
		);
		const tie = entry({ reagents: 'TBSCl, imidazole, CH2Cl2', yield: 90, uses: 1 });
		const byYield = plan(alcoholByGrignard(), [tie, best]).plans[0]!;
		expect(added(byYield, 'protect').savedCondition).toBe(best.id);
	});

	it('keeps the textbook removal when the team’s "TBAF, THF" would strip a TBDPS ether that must stay, and says why — Greene’s, Kocienski: fluoride cleaves TBDPS too', () => {
		const tbaf = entry({ kind: 'remove', reagents: 'TBAF, THF', uses: 4 });
		const answer = plan(alcoholBesideTbdps(), [tbaf]);
		const tbs = withPg(answer.plans, 'TBS');
		const removal = added(tbs, 'deprotect');
		expect(removal.reagents).not.toContain('TBAF');
		expect(removal.savedCondition).toBeUndefined();
		expect(tbs.rationale.join('\n')).toMatch(
			/TBS off: the team's saved condition \(TBAF, THF\) was not used: with it the re-check finds step "remove-TBS": .*TBDPS.*; the plan keeps the textbook recipe \((PPTS, MeOH|AcOH\/THF\/H2O|CSA, MeOH)\)\./
		);
		expect(firstClash(tbs.route)).toBeNull();
	});

	it('still follows the install entry when only the removal entry clashes', () => {
		const install = entry({ yield: 94 });
		const tbaf = entry({ kind: 'remove', reagents: 'TBAF, THF' });
		const tbs = withPg(plan(alcoholBesideTbdps(), [install, tbaf]).plans, 'TBS');
		expect(added(tbs, 'protect').savedCondition).toBe(install.id);
		expect(added(tbs, 'deprotect').savedCondition).toBeUndefined();
		expect(firstClash(tbs.route)).toBeNull();
	});

	it('keeps one deprotection step for TBS and a dioxolane rather than add one for the team’s TBS removal — Greene’s: aqueous HCl in THF cleaves both', () => {
		// A keto alcohol by a Grignard addition to its ester: the ketone (dioxolane) and the
		// primary alcohol (TBS) both come off with 1 M HCl in THF, in one step.
		const doc = line(['CC(=O)CCC(CO)CC(=O)OC', 'CC(=O)CCC(CO)CC(C)(C)O'], ['MeMgBr, THF']);
		const textbook = plan(doc).plans[0]!;
		expect(textbook.rationale.join(' ')).toContain('takes off dioxolane and TBS together');
		const tbaf = entry({ kind: 'remove', reagents: 'TBAF, THF', uses: 2 });
		const first = plan(doc, [tbaf]).plans[0]!;
		expect(first.route.steps).toEqual(textbook.route.steps);
		expect(first.addedSteps).toBe(textbook.addedSteps);
		expect(first.rationale.join(' ')).toContain(
			"TBS off: the team's saved condition (TBAF, THF) was not used: the plan takes TBS off in one step with dioxolane, and the saved condition is for TBS alone; the plan keeps that one step."
		);
	});

	it('does not follow a removal the rule table says does not remove the PG — Greene’s: benzyl ethers stand fluoride', () => {
		const wrong = entry({ protectingGroup: 'Bn', kind: 'remove', reagents: 'TBAF, THF' });
		const bn = withPg(plan(alcoholByGrignard(), [wrong]).plans, 'Bn');
		expect(added(bn, 'deprotect').reagents).toBe('H2, Pd/C, EtOH');
		expect(bn.rationale.join(' ')).toContain(
			"Bn off: the team's saved condition (TBAF, THF) was not used: the rule table does not rate Bn labile under its conditions (fluoride); the plan keeps the textbook recipe (H2, Pd/C, EtOH)."
		);
	});

	it('does not follow an entry whose reagents Orthogon cannot read, and says it could not be checked', () => {
		const unread = entry({ reagents: 'the usual mix from the blue bottle' });
		const tbs = plan(alcoholByGrignard(), [unread]).plans[0]!;
		expect(added(tbs, 'protect').reagents).toBe('TBSCl, imidazole, DMF');
		expect(tbs.rationale.join(' ')).toContain(
			'was not used: Orthogon reads no condition class in its reagents, so the re-check could not judge it'
		);
	});

	it('passes the entries through the server’s plan service, hazards of the written step included', () => {
		const answer = planRouteDocument(alcoholByGrignard(), {
			savedConditions: [entry({ uses: 1 })]
		});
		const first = answer.plans[0]!;
		const step = added(first, 'protect');
		expect(step.reagents).toBe('TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C');
		// The safety notes read the written reagents (CH2Cl2 is a chlorinated solvent), not the textbook's.
		expect(first.hazards.filter((h) => h.step === step.id).map((h) => h.reagent)).toContain(
			'CH2Cl2'
		);
	});
});
