import { describe, expect, it } from 'vitest';
import { conditionsForReagents, type ConditionId } from '../../src/lib/rules';

// Reagent text as chemists type it → condition classes. Which class a reagent brings is the
// textbook chemistry named beside each case (from memory); spellings are common practice.
const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed. — from memory';
const WUTS = 'Wuts, Greene’s Protective Groups in Organic Synthesis, 5th ed. — from memory';
const SAFETY =
	'Bretherick’s Handbook of Reactive Chemical Hazards; Prudent Practices in the Laboratory — from memory';

const conditionsOf = (text: string) => conditionsForReagents(text).conditions;

describe('classifier: route-step text', () => {
	const cases: [string, ConditionId[], string][] = [
		['TBAF, THF, 0 °C', ['fluoride'], WUTS],
		['H2 (1 atm), 10% Pd/C, EtOH', ['hydrogenation'], CLAYDEN],
		['1. (COCl)2, DMSO; 2. Et3N', ['base-amine', 'oxidant-mild'], CLAYDEN],
		['20% piperidine in DMF', ['base-amine'], WUTS],
		['TFA/DCM 1:1', ['acid-strong'], WUTS],
		['n-BuLi, THF, –78 °C then MeI', ['base-strong', 'organometallic', 'alkylating'], CLAYDEN],
		['reflux in toluene', ['heat'], 'common practice'],
		['Ac2O, pyridine, DMAP', ['base-amine', 'acylating'], WUTS],
		['K2CO3, MeOH', ['base-aqueous'], WUTS],
		['HCl in dioxane', ['acid-strong'], WUTS],
		['Pd(PPh3)4, PhSiH3, CH2Cl2', ['palladium-zero'], WUTS],
		['DDQ, CH2Cl2/H2O (10:1)', ['oxidant-electron-transfer'], WUTS],
		['NaIO4, THF/H2O', ['periodate'], CLAYDEN],
		['OsO4 (cat.), NMO, acetone/H2O', ['oxidant-strong-alkene'], CLAYDEN],
		['Na, NH3 (l), –78 °C', ['dissolving-metal'], WUTS],
		['NaH, BnBr, TBAI, DMF, 0 °C → rt', ['base-strong-hydride', 'nucleophile', 'alkylating'], WUTS],
		['ethylene glycol, p-TsOH, PhH, Dean–Stark', ['acid-mild', 'heat'], CLAYDEN],
		['LDA, THF, −78 °C; then MeI', ['base-strong', 'alkylating'], CLAYDEN],
		['NaBH4, MeOH, 0 °C', ['hydride-mild'], CLAYDEN],
		['DMSO, 140 °C', ['heat'], 'common practice'],
		['HF·pyridine, pyridine, THF', ['acid-mild', 'base-amine', 'fluoride-buffered'], WUTS]
	];
	for (const [text, expected, source] of cases) {
		it(`"${text}" → ${expected.join(', ')} (${source})`, () => {
			const read = conditionsForReagents(text);
			expect([...read.conditions].sort()).toEqual([...expected].sort());
			expect(read.unknown).toEqual([]);
		});
	}
});

describe('classifier: spellings of one reagent', () => {
	const spellings: [ConditionId, string[]][] = [
		[
			'hydride-strong',
			['LiAlH4', 'LAH', 'lithium aluminium hydride', 'lithium aluminum hydride', 'LiAlH₄', 'lah']
		],
		['hydride-strong', ['DIBAL-H', 'DIBAL', 'dibal', 'DIBAL–H']],
		['organometallic', ['n-BuLi', 'nBuLi', 'BuLi', 'n‑BuLi', 't-BuLi', 'iPrMgCl·LiCl']],
		['organometallic-grignard', ['MeMgBr', 'PhMgBr']],
		['fluoride', ['TBAF', 'tbaf', 'TASF', 'CsF']],
		['fluoride-buffered', ['HF·pyridine', 'HF•pyridine', 'Et3N·3HF', 'Et₃N·3HF']],
		[
			'acid-strong',
			['TFA', 'trifluoroacetic acid', 'HCl in dioxane', '4 M HCl in dioxane', 'HCl/dioxane']
		],
		['acid-mild', ['TsOH', 'p-TsOH', 'PTSA', 'TsOH·H2O', 'PPTS', 'CSA', 'AcOH']],
		['lewis-acid', ['BF3·OEt2', 'BF3•OEt2', 'BF3.OEt2', 'BF3·Et2O', 'TMSOTf', 'TiCl4']],
		['base-strong', ['LDA', 'KHMDS', 'KOtBu', 't-BuOK']],
		['base-strong-hydride', ['NaH', 'KH']],
		[
			'oxidant-mild',
			[
				'Swern',
				'(COCl)2, DMSO, Et3N',
				'DMP',
				'Dess–Martin periodinane',
				'Dess-Martin periodinane',
				'PCC',
				'TPAP, NMO'
			]
		],
		['oxidant-strong', ['Jones reagent', 'KMnO4']],
		['oxidant-strong-alkene', ['mCPBA', 'm-CPBA', 'MCPBA', 'OsO4', 'O3']],
		['oxidant-electron-transfer', ['DDQ', 'CAN', 'ceric ammonium nitrate']],
		['palladium-zero', ['Pd(PPh3)4', 'Pd(PPh₃)₄', 'Pd2(dba)3']],
		['hydrogenation', ['H2, Pd/C', 'H2/Pd-C', 'Pd(OH)2/C', 'Raney Ni', 'PtO2']],
		['dissolving-metal', ['Na, NH3', 'Na/NH3', 'Li, NH3', 'SmI2']],
		['base-aqueous', ['K2CO3, MeOH', 'K2CO3/MeOH', 'LiOH', 'NaOMe']],
		['hydride-mild', ['NaBH4', 'NaBH₄']],
		['hydride-mild-imine', ['NaBH3CN', 'NaBH(OAc)3']],
		['alkylating', ['MeI', 'BnBr', 'MOMCl', 'TMSCHN2']],
		['acylating', ['Ac2O', 'Ac2O, pyridine', 'TBSCl', 'Boc2O, DMAP']],
		['acylating-amine', ['Boc2O', '(Boc)2O']],
		['heat', ['heat', 'reflux', 'at reflux', 'Δ', '110 °C']]
	];
	for (const [condition, list] of spellings) {
		for (const text of list) {
			it(`"${text}" brings ${condition}`, () => {
				expect(conditionsOf(text)).toContain(condition);
			});
		}
	}
});

describe('classifier: traps', () => {
	it('does not read NaH inside NaHCO3 (a bicarbonate wash is not a strong base)', () => {
		expect(conditionsOf('sat. aq. NaHCO3')).not.toContain('base-strong');
		expect(conditionsForReagents('NaHCO3').matched.map((m) => m.reagent)).toEqual(['NaHCO3']);
		expect(conditionsOf('NaH, THF; then sat. NaHCO3')).toContain('base-strong-hydride');
	});

	it('does not read Ac2O inside AcOH, nor the other way round', () => {
		expect(conditionsOf('AcOH')).toEqual(['acid-mild']);
		expect(conditionsOf('Ac2O')).toEqual(['acylating']);
	});

	it('does not read THF inside HF, nor HF inside THF', () => {
		expect(conditionsOf('THF')).toEqual([]);
		expect(conditionsForReagents('THF').matched.map((m) => m.reagent)).toEqual(['THF']);
	});

	it('prefers the longest spelling: Pd(PPh3)4 is not PPh3, Et3N·3HF is not Et3N', () => {
		expect(conditionsForReagents('Pd(PPh3)4').matched.map((m) => m.reagent)).toEqual(['Pd(PPh3)4']);
		expect(conditionsForReagents('Et3N·3HF').matched.map((m) => m.reagent)).toEqual(['Et3N·3HF']);
		expect(conditionsForReagents('HCl in dioxane').matched.map((m) => m.reagent)).toEqual([
			'HCl in dioxane'
		]);
	});

	it('keeps PDC (an oxidant) apart from Pd–C (a catalyst)', () => {
		expect(conditionsOf('PDC, DMF')).toEqual(['oxidant-mild']);
		expect(conditionsOf('Pd–C, H2')).toEqual(['hydrogenation']);
	});

	it('reads "CAN" only in capitals, so ordinary words do not bring an oxidant', () => {
		expect(conditionsOf('CAN, MeCN/H2O')).toContain('oxidant-electron-transfer');
		expect(conditionsOf('we can stir it at rt')).toEqual([]);
	});

	it('reads mg as milligrams, not magnesium', () => {
		expect(conditionsOf('NaBH4 (50 mg), MeOH')).toEqual(['hydride-mild']);
		expect(conditionsOf('Mg, MeOH')).toEqual(['dissolving-metal']);
	});

	it('treats –78 °C as cold and 110 °C as heat', () => {
		expect(conditionsOf('n-BuLi, THF, –78 °C')).not.toContain('heat');
		expect(conditionsOf('toluene, 110 °C')).toEqual(['heat']);
		expect(conditionsOf('THF, 60 °C')).toEqual([]);
	});

	it('reports fragments it does not know, ignoring amounts, units and filler', () => {
		const read = conditionsForReagents('TBAF (1.1 equiv), unobtainium, THF, 0 °C, 2 h, under Ar');
		expect(read.unknown).toEqual(['unobtainium']);
		expect(read.conditions).toEqual(['fluoride']);
	});

	it('returns the text as typed for each match', () => {
		const read = conditionsForReagents('H2 (1 atm), 10% Pd/C');
		expect(read.matched.map((m) => m.text)).toEqual(['H2 (1 atm)', '10% Pd/C']);
	});
});

describe('classifier: hazards shown beside the step', () => {
	// Each kind of danger named in Bretherick's and Prudent Practices (from memory).
	const hazards: [string, RegExp][] = [
		['t-BuLi', /pyrophoric/i],
		['n-BuLi', /pyrophoric/i],
		['Et2Zn', /pyrophoric/i],
		['Raney Ni', /pyrophoric/i],
		['10% Pd/C', /ignite/i],
		['NaH', /water-reactive/i],
		['LiAlH4', /water-reactive/i],
		['Na, NH3', /water-reactive/i],
		['HF·pyridine', /HF source/],
		['TASF', /HF source/],
		['Et3N·3HF', /HF source/],
		['THF', /peroxide/i],
		['Et2O', /peroxide/i],
		['dioxane', /peroxide/i],
		['diisopropyl ether', /peroxide/i],
		['CO (1 atm)', /carbon monoxide/i],
		['triphosgene', /phosgene/i],
		['NaCN', /hydrogen cyanide/i],
		['O3', /ozone/i],
		['OsO4', /toxic/i],
		['mCPBA', /shock/i],
		['NaN3', /hydrazoic acid/i],
		['TMSCHN2', /toxic/i],
		['diazomethane', /explosive/i],
		['Jones reagent', /chromium\(VI\)/i],
		['PCC', /carcinogen/i],
		['benzene', /carcinogen/i],
		['CH2Cl2', /carcinogen/i],
		['H2', /flammable/i],
		['(COCl)2, DMSO', /carbon monoxide/i]
	];
	for (const [text, pattern] of hazards) {
		it(`warns about ${text} (${SAFETY})`, () => {
			const notes = conditionsForReagents(text).hazards.map((h) => h.note);
			expect(notes.length, text).toBeGreaterThan(0);
			expect(notes.join(' ')).toMatch(pattern);
			for (const note of notes) {
				expect(note).toMatch(/Check the SDS and follow your institution’s safety rules/);
			}
		});
	}

	it('lists each hazardous reagent once per step, with its name', () => {
		const read = conditionsForReagents('n-BuLi, THF; then more n-BuLi');
		expect(read.hazards.map((h) => h.reagent)).toEqual(['n-BuLi', 'THF']);
	});
});

describe('unrecognised text is read back as the chemist wrote the name', () => {
	// The loading in brackets is an amount, not part of the name; a name whose brackets pair up
	// ((DHQD)2PHAL, the Sharpless ligand; [Rh(cod)Cl]2) is kept whole (common practice).
	it.each([
		['OG-Cat 7 (5 mol%), K2CO3, DMF', ['OG-Cat 7']],
		['OG-Phos 3 (10 mol %)', ['OG-Phos 3']],
		['(DHQD)2PHAL, K2CO3, tBuOH/H2O', ['(DHQD)2PHAL']],
		['[Rh(cod)Cl]2, H2', ['[Rh(cod)Cl]2']]
	])('%s → %j', (text, unknown) => {
		expect(conditionsForReagents(text).unknown).toEqual(unknown);
	});
});
