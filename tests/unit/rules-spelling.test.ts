import { describe, expect, it } from 'vitest';
import reagents from '../../rules/reagents.json';
import { parseRuleFiles, RuleTableError } from '../../src/lib/rules';
import { standsAlone } from '../../src/lib/rules/reagent-text';
import {
	formulaFits,
	isBareMetal,
	readsAsFormula,
	spellingKey
} from '../../src/lib/rules/spelling';
import { good } from '../factories/rule-files';

// Element symbols and their case are IUPAC's; which shorthand chemists write is common practice.
describe('spelling: what a reagent spelling is', () => {
	it('reads formulas of element symbols, as written', () => {
		for (const formula of ['CoCl2', 'COCl2', 'CO', 'Co2(CO)8', 'K3Fe(CN)6', 'CeCl3·7H2O', 'NaH']) {
			expect(readsAsFormula(formula), formula).toBe(true);
		}
		// Abbreviations and lower-case typing are no formulas: LAH (no element L), hcl, DMSO.
		for (const other of ['LAH', 'hcl', 'DMSO', 'TBAF', 'NaOtBu', 'BF3·OEt2', 'sodium']) {
			expect(readsAsFormula(other), other).toBe(false);
		}
	});

	it('lets a listed formula stand for lower-case typing, not for another formula', () => {
		expect(formulaFits('COCl2', 'CoCl2')).toBe(false);
		expect(formulaFits('CO', 'Co')).toBe(false);
		expect(formulaFits('HCl', 'hcl')).toBe(true);
		expect(formulaFits('CeCl3·7H2O', 'CeCl3.7H2O')).toBe(true);
	});

	it('knows bare metals by symbol (as written) and by name', () => {
		for (const metal of ['Na', 'Li', 'Zn', 'Mg', 'Fe', 'sodium', 'Zinc', 'iron']) {
			expect(isBareMetal(metal), metal).toBe(true);
		}
		for (const other of ['NaH', 'NA', 'sodium hydride', 'Zn dust', 'LiCl']) {
			expect(isBareMetal(other), other).toBe(false);
		}
	});

	it('keys formulas by case and names by folded text', () => {
		expect(spellingKey('CoCl2', false)).not.toBe(spellingKey('COCl2', false));
		expect(spellingKey('Sodium Borohydride', false)).toBe(spellingKey('sodium borohydride', false));
	});
});

describe('spelling: a bare metal stands alone only beside amounts and forms', () => {
	const at = (text: string, word: string) => {
		const start = text.indexOf(word);
		return standsAlone(text, start, start + word.length);
	};
	it('accepts a metal context (common practice)', () => {
		expect(at('Na, NH3', 'Na')).toBe(true);
		expect(at('Li/NH3', 'Li')).toBe(true);
		expect(at('excess Zn (10 equiv), HCl', 'Zn')).toBe(true);
		expect(at('Fe powder, AcOH', 'Fe')).toBe(true);
	});
	it('rejects a salt, a compound name and a formula that goes on', () => {
		expect(at('sodium ascorbate', 'sodium')).toBe(false);
		expect(at('diethyl zinc', 'zinc')).toBe(false);
		expect(at('Zn(BH4)2, Et2O', 'Zn')).toBe(false);
	});
});

describe('rule-table loader: formulas that differ only in case are two spellings', () => {
	it('loads the bundled files, which list both CoCl2 and COCl2', () => {
		const names = (reagents as { name: string; synonyms: string[] }[])
			.filter((r) => [r.name, ...r.synonyms].some((s) => s.toLowerCase() === 'cocl2'))
			.map((r) => r.name);
		expect(names.sort()).toEqual(['CoCl2', 'phosgene']);
		expect(() => parseRuleFiles(good())).not.toThrow();
	});

	it('still rejects the same formula claimed twice', () => {
		const raw = good();
		const list = raw.reagents as { name: string; synonyms: string[] }[];
		list.find((r) => r.name === 'NiCl2')!.synonyms.push('CoCl2');
		let problems: readonly string[] = [];
		try {
			parseRuleFiles(raw);
		} catch (error) {
			if (error instanceof RuleTableError) {
				problems = error.problems;
			}
		}
		expect(problems.some((p) => p.includes('"CoCl2" is already a spelling of "CoCl2"'))).toBe(true);
	});
});
