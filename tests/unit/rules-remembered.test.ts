import { describe, expect, it } from 'vitest';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { loadRuleTable } from '../../src/lib/rules/table';

// The check's view remembers each rating (the planner asks millions of times per route). The
// remembered answer must be the table's own, whichever array the reagents arrive in, and answers
// for different reagent sets or sites must never be mixed up.

const table = loadRuleTable();

describe('remembered ratings', () => {
	it('answers as the table does, for a fresh or a reused reagent array', () => {
		const rules = checkRulesFrom(table);
		const tbaf = ['TBAF'];
		const first = rules.stability('TBS', 'fluoride', tbaf);
		expect(first).toEqual(table.stabilityOf('TBS', 'fluoride', ['TBAF']));
		expect(rules.stability('TBS', 'fluoride', tbaf)).toBe(first);
		expect(rules.stability('TBS', 'fluoride', ['TBAF'])).toBe(first);
	});

	it('keeps reagent sets apart: a reagent rating is not its class rating', () => {
		const rules = checkRulesFrom(table);
		// Pd(0) inserts into Ar–Br/Ar–I, but PdCl2(PPh3)2/CuI at room temperature takes an aryl
		// iodide well before a bromide (Chinchilla & Nájera, Chem. Rev. 2007, 107, 874 — from memory).
		const byClass = rules.reactivity('aryl-halide-br-i', 'palladium-zero', []);
		const byReagent = rules.reactivity('aryl-halide-br-i', 'palladium-zero', ['PdCl2(PPh3)2']);
		expect(byClass?.rating).toBe('reacts');
		expect(byReagent?.rating).toBe('caution');
		expect(rules.reactivity('aryl-halide-br-i', 'palladium-zero', [])).toBe(byClass);
	});

	it('keeps sites apart: a phenolic TBS ether falls to aqueous base, an alkyl one stands', () => {
		const rules = checkRulesFrom(table);
		// Greene's Protective Groups, 5th ed., ch. 4 (from memory).
		expect(rules.stability('TBS', 'base-aqueous', [], 'aryl-oxygen').rating).toBe('labile');
		expect(rules.stability('TBS', 'base-aqueous', []).rating).toBe('stable');
		expect(rules.stability('TBS', 'base-aqueous', [], 'aryl-oxygen').rating).toBe('labile');
	});
});
