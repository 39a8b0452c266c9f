import { describe, expect, it } from 'vitest';
import {
	checkStep,
	StepStructureError,
	UnknownConditionError,
	type StepToCheck
} from '../../src/lib/rules/check';
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

describe('steps that must clash', () => {
	it('a Grignard reagent attacks the free ketone that should stand by — Clayden, ketones are attacked by RMgX (from memory)', () => {
		const result = check({
			substrate: 'CC(=O)CCC(=O)OC',
			product: 'CC(=O)CCC(C)(C)O',
			reagents: 'MeMgBr, THF'
		});
		expect(result.clashes).toEqual([
			expect.objectContaining({
				severity: 'clash',
				kind: 'attacks-free-group',
				subject: 'ketone',
				condition: 'organometallic-grignard',
				atoms: [0, 1, 2, 3]
			})
		]);
		expect(result.clashes[0]!.message).toMatch(/^MeMgBr \(.+\) attacks the free ketone/);
		expect(result.clashes[0]!.message).toMatch(/Source: /);
	});
	it("TBAF cannot remove one TBS ether and keep another — both are fluoride-labile (Greene's, from memory)", () => {
		expect(
			summary({
				substrate: `${TBS}CCCCO[Si](C)(C)C(C)(C)C`,
				product: `OCCCCO[Si](C)(C)C(C)(C)C`,
				reagents: 'TBAF, THF'
			})
		).toEqual(['clash removes-protecting-group TBS fluoride']);
	});
	it("hydrogenolysis of a Cbz carbamate also removes a benzyl ether that should stay (Greene's, from memory)", () => {
		expect(
			summary({
				substrate: 'O=C(NCCCCOCc1ccccc1)OCc1ccccc1',
				product: 'NCCCCOCc1ccccc1',
				reagents: 'H2, Pd/C, MeOH'
			})
		).toContain('clash removes-protecting-group Bn hydrogenation');
	});
	it("TFA removing Boc also cleaves a tert-butyl ester (Greene's, from memory)", () => {
		expect(
			summary({
				substrate: 'CC(C)(C)OC(=O)NCCC(=O)OC(C)(C)C',
				product: 'NCCC(=O)OC(C)(C)C',
				reagents: 'TFA, DCM'
			})
		).toContain('clash removes-protecting-group tBu-ester acid-strong');
	});
	it("TFA removing Boc also opens an acetonide (Greene's, acetonides are acid-labile, from memory)", () => {
		expect(
			summary({
				substrate: 'CC(C)(C)OC(=O)NCCC1COC(C)(C)O1',
				product: 'NCCC1COC(C)(C)O1',
				reagents: 'TFA, DCM'
			})
		).toContain('clash removes-protecting-group acetonide acid-strong');
	});
	it('catalytic hydrogenation meant for a benzyl ether also reduces a free alkene (Clayden, from memory)', () => {
		expect(
			summary({ substrate: 'C=CCCCCOCc1ccccc1', product: 'C=CCCCCO', reagents: 'H2, Pd/C, EtOH' })
		).toContain('clash attacks-free-group alkene hydrogenation');
	});
	it('n-BuLi is quenched by a free alcohol (Clayden, O–H is far more acidic than the alkyne C–H it should remove, from memory)', () => {
		expect(
			summary({
				substrate: 'OCCCC#C',
				product: 'OCCCC#CC',
				reagents: 'n-BuLi, THF, -78 °C; then MeI'
			})
		).toContain('clash attacks-free-group alcohol-primary organometallic');
	});
	it('LiAlH4 meant for an ester also reduces a free ketone (Clayden, from memory)', () => {
		expect(
			summary({ substrate: 'CC(=O)CCC(=O)OC', product: 'CC(=O)CCCO', reagents: 'LiAlH4, THF' })
		).toContain('clash attacks-free-group ketone hydride-strong');
	});
	it('periodate cleaves a free 1,2-diol that should stand by (Clayden, glycol cleavage, from memory)', () => {
		// The step oxidises a thiol-free side of the molecule with NaIO4 (sulfide to sulfoxide) and keeps the diol.
		expect(
			summary({ substrate: 'OCC(O)CCCSC', product: 'OCC(O)CCCS(C)=O', reagents: 'NaIO4, MeOH/H2O' })
		).toContain('clash attacks-free-group diol-1,2 periodate');
	});
	it("aqueous acid meant for a dioxolane also removes a TMS ether (Greene's, TMS ethers are the most acid-labile silyl ethers, from memory)", () => {
		expect(
			summary({
				substrate: 'C[Si](C)(C)OCCCC1(C)OCCO1',
				product: 'C[Si](C)(C)OCCCC(C)=O',
				reagents: 'aq. HCl, acetone'
			})
		).toContain('clash removes-protecting-group TMS acid-mild');
	});
	it('piperidine meant for one Fmoc carbamate also removes a second one that should stay (Kocienski, from memory)', () => {
		expect(
			summary({
				substrate: `O=C(NCCCCN${FMOC})OCC1c2ccccc2-c2ccccc12`,
				product: `NCCCCN${FMOC}`,
				reagents: '20% piperidine in DMF'
			})
		).toContain('clash removes-protecting-group Fmoc base-amine');
	});
	it("Pd(0) meant for an Alloc carbamate also removes an allyl ester (Greene's, both are π-allyl substrates, from memory)", () => {
		expect(
			summary({
				substrate: 'C=CCOC(=O)NCCC(=O)OCC=C',
				product: 'NCCC(=O)OCC=C',
				reagents: 'Pd(PPh3)4, morpholine'
			})
		).toContain('clash removes-protecting-group allyl-ester palladium-zero');
	});
	it("piperidine for Fmoc removal puts an acetate at most at caution, never a clash (Greene's, from memory)", () => {
		const severities = check({
			substrate: `CC(=O)OCCCN${FMOC}`,
			product: 'CC(=O)OCCCN',
			reagents: '20% piperidine in DMF'
		})
			.clashes.filter((c) => c.subject === 'Ac')
			.map((c) => c.severity);
		expect(severities.every((s) => s === 'caution')).toBe(true);
	});
});

describe('how the check reads a step', () => {
	it('unions explicit condition ids with those inferred from the reagent text', () => {
		const result = check({
			substrate: 'CC(=O)CCC(=O)OC',
			product: 'CC(=O)CCC(C)(C)O',
			reagents: 'MeMgBr, THF',
			conditions: ['heat']
		});
		expect(result.conditions).toEqual(expect.arrayContaining(['heat', 'organometallic-grignard']));
	});
	it('refuses an unknown explicit condition id and lists the valid ones', () => {
		expect(() => check({ substrate: 'CCO', product: 'CC=O', conditions: ['acid-stronk'] })).toThrow(
			UnknownConditionError
		);
		expect(() => check({ substrate: 'CCO', product: 'CC=O', conditions: ['acid-stronk'] })).toThrow(
			/"acid-stronk".*valid ids are: .*acid-strong/
		);
	});
	it('names the step and the side of an unreadable structure', () => {
		expect(() => checkStep(rules, { id: 'bad-step', substrate: 'C1CC', product: 'CCO' })).toThrow(
			StepStructureError
		);
		expect(() =>
			checkStep(rules, { id: 'bad-step', substrate: 'CCO', product: 'C(C)(C)(C)(C)C' })
		).toThrow(/Step "bad-step": the product cannot be read/);
	});
	it('shows hazard notes for dangerous reagents (n-BuLi is pyrophoric — Bretherick, from memory)', () => {
		const { hazards } = check({
			substrate: `${TBS}CCCC#C`,
			product: `${TBS}CCCC#CC`,
			reagents: 'n-BuLi, THF; then MeI'
		});
		expect(hazards.map((h) => h.note).join(' ')).toMatch(/pyrophoric/i);
	});
	it('checks a convergent step with two substrates (amide coupling leaves the Boc group alone — common practice)', () => {
		const result = check({
			substrate: ['OC(=O)CCNC(=O)OC(C)(C)C', 'NCc1ccccc1'],
			product: 'O=C(CCNC(=O)OC(C)(C)C)NCc1ccccc1',
			reagents: 'EDC, HOBt, DMF'
		});
		expect(result.clashes.filter((c) => c.subject === 'Boc')).toEqual([]);
	});
});
