import { describe, expect, it } from 'vitest';
import { loadRuleTable } from '../../src/lib/rules/table';
import type { RuleOverrideBody } from '../../src/lib/team-rules/contract';
import { ruleGrid } from '../../src/lib/team-rules/grid';
import { checkOverride } from '../../src/lib/team-rules/validate';

// The pure half of the team's rule overrides: the checks beyond zod against the bundled rule
// table, and the grid the rules page shows.

const table = loadRuleTable();
const body = (over: Partial<RuleOverrideBody>): RuleOverrideBody => ({
	subject: 'TBS',
	condition: 'lewis-acid',
	rating: 'labile',
	reason: 'Lost on our substrates with BF3·OEt2.',
	source: 'Notebook OG-12, p. 40',
	...over
});

describe('checkOverride', () => {
	it('accepts a PG with a stability rating and a free group with a reactivity rating', () => {
		expect(checkOverride(table, body({}))).toMatchObject({ ok: true, kind: 'protecting-group' });
		expect(
			checkOverride(table, body({ subject: 'alcohol-primary', rating: 'none' }))
		).toMatchObject({ ok: true, kind: 'free-group' });
	});

	it('names the field: unknown subject, a rating that does not fit, unknown condition', () => {
		const problem = (b: RuleOverrideBody) => {
			const checked = checkOverride(table, b);
			return checked.ok ? null : checked.problem.field;
		};
		expect(problem(body({ subject: 'TBX' }))).toBe('subject');
		expect(problem(body({ rating: 'reacts' }))).toBe('rating');
		expect(problem(body({ subject: 'alcohol-primary', rating: 'labile' }))).toBe('rating');
		expect(problem(body({ condition: 'acid-medium' as RuleOverrideBody['condition'] }))).toBe(
			'condition'
		);
	});

	it('takes a reagent of the class or of a finer class, by name or synonym, stored by its name', () => {
		// rules/reagents.json: TBAF brings fluoride; nBu4NF is one of its synonyms.
		const byName = checkOverride(table, body({ condition: 'fluoride', reagent: 'TBAF' }));
		expect(byName).toMatchObject({ ok: true, override: { reagent: 'TBAF' } });
		const bySynonym = checkOverride(table, body({ condition: 'fluoride', reagent: 'nbu4nf' }));
		expect(bySynonym).toMatchObject({ ok: true, override: { reagent: 'TBAF' } });
		// MeMgBr brings organometallic-grignard, a finer class of organometallic.
		expect(
			checkOverride(table, body({ condition: 'organometallic', reagent: 'MeMgBr' }))
		).toMatchObject({ ok: true });
	});

	it('refuses an unknown reagent, one of another class, and a solvent, naming the reagent field', () => {
		for (const [condition, reagent, says] of [
			['fluoride', 'unobtainium', 'not a reagent of the rule table'],
			['acid-strong', 'TBAF', 'TBAF brings fluoride'],
			// A finer class does not cover its broader class's other reagents.
			['organometallic-grignard', 'TBAF', 'not organometallic-grignard'],
			['acid-strong', 'DCM', 'CH2Cl2 brings no condition class']
		] as const) {
			const checked = checkOverride(table, body({ condition, reagent }));
			expect(checked.ok).toBe(false);
			if (!checked.ok) {
				expect(checked.problem.field).toBe('reagent');
				expect(checked.problem.message).toContain(says);
			}
		}
	});
});

describe('ruleGrid', () => {
	it('shows the table’s own ratings without a layer', () => {
		const grid = ruleGrid(table, new Map([['TBS', 'TBS ether']]));
		const tbs = grid.rows.find((row) => row.id === 'TBS')!;
		expect(tbs.label).toBe('TBS ether');
		expect(tbs.ratings[grid.conditions.findIndex((c) => c.id === 'base-aqueous')]).toBe('stable');
		expect(tbs.overridden).toEqual([]);
	});
});
