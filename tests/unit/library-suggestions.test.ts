import { describe, expect, it } from 'vitest';
import { pgChanges, stepReagentsOf, suggestionsFor } from '../../src/lib/library/suggestions';
import { libraryEntry } from '../factories/library-entries';

describe('pgChanges: which protecting groups a step puts on or takes off', () => {
	it('finds a group that appears in the product', () => {
		expect(pgChanges([['TBS']], ['TBS', 'Bn'])).toEqual([
			{ protectingGroup: 'Bn', kind: 'install' }
		]);
	});

	it('finds a group that is gone from the product, across several substrates', () => {
		expect(pgChanges([['TBS'], ['Boc']], ['Boc'])).toEqual([
			{ protectingGroup: 'TBS', kind: 'remove' }
		]);
	});

	it('counts copies: a second TBS on a diol is an install', () => {
		expect(pgChanges([['TBS']], ['TBS', 'TBS'])).toEqual([
			{ protectingGroup: 'TBS', kind: 'install' }
		]);
	});

	it('a step that keeps its groups changes none', () => {
		expect(pgChanges([['TBS', 'Boc']], ['Boc', 'TBS'])).toEqual([]);
	});
});

describe('suggestionsFor: the entries the step panel offers', () => {
	const tbsOn = [
		libraryEntry({ reagents: 'plain', uses: 5 }),
		libraryEntry({ reagents: 'approved, unused', approved: true, uses: 0 }),
		libraryEntry({ reagents: 'approved, used', approved: true, uses: 3 }),
		libraryEntry({ reagents: 'retired', approved: true, uses: 9, retired: true }),
		libraryEntry({ reagents: 'other PG', protectingGroup: 'Bn', approved: true }),
		libraryEntry({ reagents: 'takes it off', kind: 'remove', approved: true })
	];
	const reagents = (list: { reagents: string }[]) => list.map((e) => e.reagents);

	it('orders approved first, then by uses, and leaves out retired and other groups or kinds', () => {
		const offered = suggestionsFor(tbsOn, [{ protectingGroup: 'TBS', kind: 'install' }], 'protect');
		expect(reagents(offered)).toEqual(['approved, used', 'approved, unused', 'plain']);
	});

	it('a removal step gets the removal entries of the group that goes', () => {
		const offered = suggestionsFor(tbsOn, [{ protectingGroup: 'TBS', kind: 'remove' }], undefined);
		expect(reagents(offered)).toEqual(['takes it off']);
	});

	it('falls back to the intent when the structures show no change', () => {
		expect(reagents(suggestionsFor(tbsOn, [], 'deprotect'))).toEqual(['takes it off']);
		// Every install entry, whatever its group; ties (same approval, uses and date) keep their order.
		expect(reagents(suggestionsFor(tbsOn, [], 'protect'))).toEqual([
			'approved, used',
			'approved, unused',
			'other PG',
			'plain'
		]);
	});

	it('offers nothing for a plain transformation', () => {
		expect(suggestionsFor(tbsOn, [], 'transform')).toEqual([]);
		expect(suggestionsFor(tbsOn, [], undefined)).toEqual([]);
	});
});

describe('stepReagentsOf: what a step following an entry carries', () => {
	it('joins the reagents with the solvent and temperature the classifier reads', () => {
		const entry = { reagents: 'TBSOTf, 2,6-lutidine', solvent: 'CH2Cl2', temperature: '−78 °C' };
		expect(stepReagentsOf(entry)).toBe('TBSOTf, 2,6-lutidine, CH2Cl2, −78 °C');
	});

	it('leaves out what the entry does not say', () => {
		expect(stepReagentsOf({ reagents: 'TBAF', solvent: null, temperature: ' ' })).toBe('TBAF');
	});

	it('does not write a solvent or temperature twice when the reagents already name it', () => {
		const entry = { reagents: 'TBAF, AcOH, thf, 0 °C', solvent: 'THF', temperature: '0 °C' };
		expect(stepReagentsOf(entry)).toBe('TBAF, AcOH, thf, 0 °C');
	});
});
