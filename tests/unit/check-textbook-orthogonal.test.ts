import { describe, expect, it } from 'vitest';
import { checkStep, type StepToCheck } from '../../src/lib/rules/check';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';

// The clash check against textbook facts of protecting-group practice. Each case names its
// source. "Greene's" is Wuts, Greene's Protective Groups in Organic Synthesis (5th ed.);
// "Kocienski" is Kocienski, Protecting Groups (3rd ed.); "Clayden" is Clayden, Greeves & Warren,
// Organic Chemistry (2nd ed.). They are recalled, not read, hence "from memory".

const rules = checkRulesFrom();
const check = (step: Omit<StepToCheck, 'id'>) => checkStep(rules, { id: 'step', ...step });
const summary = (step: Omit<StepToCheck, 'id'>) =>
	check(step)
		.clashes.map((c) => `${c.severity} ${c.kind} ${c.subject} ${c.condition}`)
		.sort();

// Fragments of an invented scenario (fictional intermediates of "OG-2031" and friends).
const TBS = 'CC(C)(C)[Si](C)(C)O';
const FMOC = 'C(=O)OCC1c2ccccc2-c2ccccc12';

describe('steps that must not clash (orthogonal pairs)', () => {
	it("a Grignard reagent adds to an ester while the ketone is masked as a dioxolane — Greene's, acetals are stable to organometallics (from memory)", () => {
		expect(
			summary({
				substrate: 'CC1(CCC(=O)OC)OCCO1',
				product: 'CC1(CCC(C)(C)O)OCCO1',
				reagents: 'MeMgBr, THF'
			})
		).toEqual([]);
	});
	it("TBAF removes a TBS ether and spares a benzyl ether — Greene's, Bn ethers are stable to fluoride (from memory)", () => {
		expect(
			summary({
				substrate: `${TBS}CCCCOCc1ccccc1`,
				product: 'OCCCCOCc1ccccc1',
				reagents: 'TBAF, THF'
			})
		).toEqual([]);
	});
	it("hydrogenolysis removes a benzyl ether and spares a TBS ether — Greene's, silyl ethers survive H2/Pd-C (from memory)", () => {
		expect(
			summary({
				substrate: `${TBS}CCCCOCc1ccccc1`,
				product: `${TBS}CCCCO`,
				reagents: 'H2, Pd/C, EtOH'
			})
		).toEqual([]);
	});
	it('TFA removes Boc and spares Fmoc — the Boc/Fmoc orthogonal pair of peptide synthesis (Kocienski, from memory)', () => {
		expect(
			summary({
				substrate: `CC(C)(C)OC(=O)NCCCCN${FMOC}`,
				product: `NCCCCN${FMOC}`,
				reagents: 'TFA, DCM'
			})
		).toEqual([]);
	});
	it('piperidine removes Fmoc and spares Boc — the same pair the other way round (Kocienski, from memory)', () => {
		expect(
			summary({
				substrate: `CC(C)(C)OC(=O)NCCCCN${FMOC}`,
				product: 'CC(C)(C)OC(=O)NCCCCN',
				reagents: '20% piperidine in DMF'
			})
		).toEqual([]);
	});
	it('an amide coupling with HATU and DIPEA leaves Fmoc in place — the coupling step of Fmoc peptide synthesis (Kocienski, from memory)', () => {
		const severities = check({
			substrate: ['OC(=O)CCN' + FMOC, 'NCc1ccccc1'],
			product: 'O=C(CCN' + FMOC + ')NCc1ccccc1',
			reagents: 'HATU, DIPEA, DMF'
		})
			.clashes.filter((c) => c.subject === 'Fmoc')
			.map((c) => c.severity);
		expect(severities).not.toContain('clash');
	});
	it("Pd(0) removes Alloc and spares Boc — Greene's, Alloc is cleaved by Pd(PPh3)4 with a scavenger (from memory)", () => {
		expect(
			summary({
				substrate: 'CC(C)(C)OC(=O)NCCCCNC(=O)OCC=C',
				product: 'CC(C)(C)OC(=O)NCCCCN',
				reagents: 'Pd(PPh3)4, morpholine, THF'
			})
		).toEqual([]);
	});
	it("DDQ removes a PMB ether and spares a benzyl ether — Greene's, oxidative PMB cleavage (from memory)", () => {
		expect(
			summary({
				substrate: 'COc1ccc(COCCCCOCc2ccccc2)cc1',
				product: 'OCCCCOCc1ccccc1',
				reagents: 'DDQ, CH2Cl2, H2O'
			})
		).toEqual([]);
	});
	it("periodate cleaves a free 1,2-diol while an acetonide-protected diol stands by — Greene's, acetonides survive NaIO4 (from memory)", () => {
		const substrate = 'OCC(O)CCC1COC(C)(C)O1';
		const product = 'O=CCCC1COC(C)(C)O1';
		expect(summary({ substrate, product, reagents: 'NaIO4, THF/H2O' })).toEqual([]);
	});
	it('n-BuLi metalates a TBS-protected alkynol without trouble — Clayden, silyl ethers hide the O–H from organolithiums (from memory)', () => {
		expect(
			summary({
				substrate: `${TBS}CCCC#C`,
				product: `${TBS}CCCC#CC`,
				reagents: 'n-BuLi, THF, -78 °C; then MeI'
			})
		).toEqual([]);
	});
	it("Swern oxidation of a primary alcohol spares a TBS ether — Greene's (from memory)", () => {
		expect(
			summary({
				substrate: `${TBS}CCCCCO`,
				product: `${TBS}CCCCC=O`,
				reagents: '(COCl)2, DMSO, Et3N'
			})
		).toEqual([]);
	});
	it('LiAlH4 reduces an ester while the ketone is a dioxolane — Clayden, why the ketone was masked (from memory)', () => {
		expect(
			summary({
				substrate: 'CC1(CCC(=O)OC)OCCO1',
				product: 'CC1(CCCO)OCCO1',
				reagents: 'LiAlH4, THF'
			})
		).toEqual([]);
	});
	it('an intended deprotection is not reported against the group it removes — aqueous acid on a dioxolane (common practice)', () => {
		expect(
			summary({
				substrate: 'CC1(CCC(C)(C)O)OCCO1',
				product: 'CC(=O)CCC(C)(C)O',
				reagents: 'aq. HCl, acetone'
			})
		).toEqual([]);
	});
});
