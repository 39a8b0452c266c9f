import { describe, expect, it } from 'vitest';
import { conditionsForReagents, type ConditionId } from '../../src/lib/rules';

// The salt/metal, formula-case and double-count traps of issue 11. Which class a reagent brings is
// the chemistry named beside each case; spellings are as chemists write them (common practice).
const WUTS = 'Wuts, Greene’s Protective Groups in Organic Synthesis, 5th ed. — from memory';
const CLAYDEN = 'Clayden, Greeves & Warren, Organic Chemistry, 2nd ed. — from memory';
const CUAAC =
	'Rostovtsev, Green, Fokin & Sharpless, Angew. Chem. Int. Ed. 2002, 41, 2596 — from memory';
const AD = 'Kolb, VanNieuwenhze & Sharpless, Chem. Rev. 1994, 94, 2483 (AD-mix) — from memory';
const PAUSON_KHAND =
	'Kürti & Czakó, Strategic Applications of Named Reactions, Pauson–Khand — from memory';
const ZN_BH4 =
	'Narasimhan & Balakumar, Aldrichimica Acta 1998, 31, 19 (zinc borohydride) — from memory';
const COCL2_NABH4 = 'Satoh & Suzuki, Tetrahedron Lett. 1969, 4555 (CoCl2/NaBH4) — from memory';

const read = (text: string) => conditionsForReagents(text);
const names = (text: string) => read(text).matched.map((m) => m.reagent);

describe('classifier: a salt is not its metal', () => {
	// Sodium, lithium, potassium, zinc and magnesium salts are spectators, bases or nucleophiles;
	// none is a dissolving metal (common practice).
	const salts = [
		'NaCl',
		'sodium chloride',
		'brine',
		'sodium ascorbate',
		'CuSO4, sodium ascorbate, t-BuOH/H2O',
		'K3PO4',
		'potassium phosphate',
		'K3Fe(CN)6',
		'potassium ferricyanide',
		'LiBr',
		'lithium bromide',
		'NaBr',
		'KBr',
		'KI',
		'lithium chloride',
		'MgSO4',
		'magnesium sulfate',
		'Zn(BH4)2',
		'zinc borohydride',
		'zinc chloride',
		'Zn(OTf)2',
		'Mg(ClO4)2',
		'NaOtBu',
		'sodium tert-butoxide'
	];
	for (const text of salts) {
		it(`"${text}" brings no dissolving metal and is recognised`, () => {
			const answer = read(text);
			expect(answer.conditions).not.toContain('dissolving-metal');
			expect(answer.conditions).not.toContain('organometallic');
			expect(answer.matched.map((m) => m.reagent)).not.toContain('sodium metal');
			expect(answer.unknown).toEqual([]);
		});
	}

	it('reads the listed salts and additives with their classes', () => {
		const cases: [string, ConditionId[], string][] = [
			['K3PO4, Pd(PPh3)4, dioxane/H2O', ['base-aqueous-mild', 'palladium-zero'], 'common practice'],
			['NaOtBu, Pd2(dba)3, toluene', ['base-strong', 'palladium-zero'], 'common practice'],
			['CuSO4, sodium ascorbate', ['soft-metal'], CUAAC],
			['K3Fe(CN)6, K2CO3, OsO4 (cat.)', ['base-aqueous', 'oxidant-strong-alkene'], AD],
			['Zn(BH4)2, Et2O', ['hydride-mild'], ZN_BH4],
			['ZnBr2, CH2Cl2', ['lewis-acid'], WUTS],
			['CoCl2·6H2O, NaBH4, MeOH', ['hydride-mild'], COCL2_NABH4],
			['NiCl2, NaBH4, MeOH', ['hydride-mild'], 'common practice'],
			['LiBr, DBU, MeCN', ['base-amine'], 'Masamune–Roush conditions — from memory'],
			['KI, K2CO3, acetone', ['base-aqueous-mild', 'nucleophile'], 'common practice'],
			['Zn(OTf)2, CH2Cl2', ['lewis-acid'], 'common practice'],
			['Mg(ClO4)2, MeCN', ['lewis-acid'], 'common practice'],
			['KOAc, Pd(dppf)Cl2, dioxane', ['palladium-zero'], 'Miyaura borylation — from memory']
		];
		for (const [text, expected, source] of cases) {
			const answer = read(text);
			expect([...answer.conditions].sort(), `${text} (${source})`).toEqual([...expected].sort());
			expect(answer.unknown, text).toEqual([]);
		}
	});
});

describe('classifier: a metal in a metal context is still the metal', () => {
	const cases: [string, ConditionId[], string][] = [
		['Na, NH3(l), −78 °C', ['dissolving-metal'], WUTS],
		['Na, NH3 (l), –78 °C', ['dissolving-metal'], WUTS],
		['Li, NH3', ['dissolving-metal'], WUTS],
		['Li/NH3, THF, t-BuOH', ['dissolving-metal'], WUTS],
		['sodium, liquid NH3', ['dissolving-metal'], WUTS],
		['Zn, AcOH', ['acid-mild', 'dissolving-metal-acid'], WUTS],
		['Zn dust, AcOH', ['acid-mild', 'dissolving-metal-acid'], WUTS],
		['Zn (10 equiv), HCl', ['acid-strong', 'dissolving-metal-acid'], CLAYDEN],
		['Fe, NH4Cl, EtOH/H2O', ['dissolving-metal-acid'], CLAYDEN],
		['Fe powder, AcOH', ['acid-mild', 'dissolving-metal-acid'], CLAYDEN],
		['Mg turnings, THF', ['organometallic-grignard'], CLAYDEN]
	];
	for (const [text, expected, source] of cases) {
		it(`"${text}" → ${expected.join(', ')} (${source})`, () => {
			const answer = read(text);
			expect([...answer.conditions].sort()).toEqual([...expected].sort());
			expect(answer.unknown).toEqual([]);
		});
	}

	it('names the couple that was written: Fe, NH4Cl is not Fe, HCl (common practice)', () => {
		expect(names('Fe, NH4Cl, EtOH/H2O')).toEqual(['Fe, NH4Cl', 'EtOH', 'water']);
		expect(names('Fe/AcOH')).toEqual(['Fe, AcOH']);
	});

	it('does not take a metal name inside a compound name for the metal', () => {
		// Diethylzinc is an organometallic, not zinc metal (common practice).
		expect(read('diethyl zinc').conditions).not.toContain('dissolving-metal');
	});
});

describe('classifier: formula case carries meaning', () => {
	it(`reads CoCl2 as cobalt chloride, not phosgene (${COCL2_NABH4})`, () => {
		expect(names('CoCl2')).toEqual(['CoCl2']);
		expect(read('CoCl2').conditions).not.toContain('acylating');
		expect(names('COCl2')).toEqual(['phosgene']);
	});

	it(`reads Co2(CO)8 as the cobalt carbonyl, not carbon monoxide gas (${PAUSON_KHAND})`, () => {
		const answer = read('Co2(CO)8, CH2Cl2; then NMO');
		expect(answer.matched.map((m) => m.reagent)).toContain('Co2(CO)8');
		expect(answer.matched.map((m) => m.reagent)).not.toContain('carbon monoxide');
		expect(answer.unknown).toEqual([]);
	});

	it('reads "CO (1 atm)" as carbon monoxide and "Co" as cobalt, not CO', () => {
		expect(names('Pd(OAc)2, dppf, CO (1 atm), MeOH')).toContain('carbon monoxide');
		expect(names('Co')).not.toContain('carbon monoxide');
	});

	it('still folds case where it means nothing: names and unambiguous formulas', () => {
		expect(names('hcl')).toEqual(['HCl']);
		expect(names('nah')).toEqual(['NaH']);
		expect(names('Sodium Borohydride')).toEqual(['NaBH4']);
		expect(names('k2co3')).toEqual(['K2CO3']);
	});
});

describe('classifier: HF·pyridine counts once', () => {
	const spellings = [
		'HF·pyridine',
		'HF-py',
		'HF/py',
		'HF–pyridine',
		'HF·pyr',
		'HF•py',
		'pyridine·HF'
	];
	for (const text of spellings) {
		it(`"${text}" is one reagent (${WUTS})`, () => {
			expect(names(text)).toEqual(['HF·pyridine']);
			expect([...read(text).conditions].sort()).toEqual(['acid-mild', 'fluoride-buffered']);
		});
	}
});
