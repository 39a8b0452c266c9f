import { describe, expect, it } from 'vitest';
import { conditionOrigins } from '../../src/lib/rules/check/condition-origins';
import { checkRulesFrom } from '../../src/lib/rules/check/rules-adapter';
import { stepConditions } from '../../src/lib/rules/plan/tree';

// One rule, read by the clash check and the planner alike: a class set by hand that a named reagent
// also brings is judged by that reagent. Imidazole as the amine base of a TBSCl silylation:
// Corey & Venkateswarlu, J. Am. Chem. Soc. 1972, 94, 6190 (from memory).

const rules = checkRulesFrom();
const explicit = ['acylating', 'base-amine'];

describe('condition origins', () => {
	it('gives an explicit class a named reagent brings to that reagent', () => {
		const origins = conditionOrigins(explicit, rules.classify('TBSCl, imidazole, DMF'));
		const base = origins.find((o) => o.id === 'base-amine');
		expect(base?.explicit).toBe(false);
		expect(base?.reagents.map((b) => b.reagent)).toEqual(['imidazole']);
	});

	it('keeps a class no reagent brings as the whole class, set by hand', () => {
		const origins = conditionOrigins(explicit, rules.classify('TBSCl, DMF'));
		expect(origins.find((o) => o.id === 'base-amine')).toEqual({
			id: 'base-amine',
			reagents: [],
			explicit: true
		});
	});

	it('lists explicit classes first, each once', () => {
		const ids = conditionOrigins(explicit, rules.classify('TBSCl, imidazole, DMF')).map(
			(o) => o.id
		);
		expect(ids.slice(0, 2)).toEqual(explicit);
		expect(new Set(ids).size).toBe(ids.length);
	});

	it('is what the planner reads a step by, minus classes the table does not know', () => {
		const text = 'TBSCl, imidazole, DMF';
		const fromCheck = conditionOrigins(explicit, rules.classify(text)).map((o) => ({
			id: o.id,
			reagents: o.reagents.map((b) => b.reagent),
			explicit: o.explicit
		}));
		expect(stepConditions(rules, text, [...explicit, 'no-such-class'])).toEqual(fromCheck);
	});
});
