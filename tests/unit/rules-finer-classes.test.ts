import { describe, expect, it } from 'vitest';
import { buildRuleTable } from '../../src/lib/rules';
import { DEFAULT_RULE_FILES } from '../../src/lib/rules/default-files';
import { RuleTableError } from '../../src/lib/rules/issues';

// A finer condition class (rules/conditions.json `refines`) inherits its broader class's ratings
// unless a row rates it itself; see rules/README.md, "Finer classes".

type Raw = typeof DEFAULT_RULE_FILES;
const copy = (): Raw => structuredClone(DEFAULT_RULE_FILES) as Raw;
const pgRows = (raw: Raw) =>
	raw.protectingGroups as { id: string; stability: Record<string, string> }[];
const reactivityRows = (raw: Raw) => raw.reactivity as Record<string, string>[];

function problemsOf(raw: Raw): string[] {
	try {
		buildRuleTable(raw);
		return [];
	} catch (error) {
		if (error instanceof RuleTableError) {
			return [...error.problems];
		}
		throw error;
	}
}

describe('finer condition classes', () => {
	it('inherit the broader class rating where a row does not rate them', () => {
		const table = buildRuleTable(copy());
		// TBS is acid-labile as a class (Wuts, Greene's PGOS, 5th ed., silyl ethers — from memory);
		// TBS rates acid-mild-aprotic itself, so TES under buffered fluoride shows the inheritance.
		expect(pgRows(copy()).find((pg) => pg.id === 'TBS')!.stability['acid-mild-aprotic']).toBe(
			'stable'
		);
		expect(table.stabilityOf('TES', 'fluoride-buffered').rating).toBe(
			table.stabilityOf('TES', 'fluoride').rating
		);
		expect(table.ratingsOf('Bn')['oxidant-mild-primary']).toBe(
			table.ratingsOf('Bn')['oxidant-mild']
		);
	});

	it('use their own rating where the row gives one, and leave the broader class alone', () => {
		const raw = copy();
		pgRows(raw).find((pg) => pg.id === 'TES')!.stability['fluoride-buffered'] = 'stable';
		const table = buildRuleTable(raw);
		expect(table.stabilityOf('TES', 'fluoride-buffered').rating).toBe('stable');
		expect(table.stabilityOf('TES', 'fluoride').rating).not.toBe('stable');
	});

	it('let a team override on the broader class reach a finer class the defaults do not rate', () => {
		const table = buildRuleTable(copy(), {
			name: 'Team Kestrel',
			stability: [
				{ protectingGroup: 'Piv', condition: 'lewis-acid', rating: 'caution', reason: 'our hands' }
			]
		});
		expect(table.stabilityOf('Piv', 'lewis-acid-mild')).toMatchObject({
			rating: 'caution',
			layer: 'override'
		});
	});

	it('inherit reactivity rows, and a `none` row says the broader row does not apply', () => {
		const raw = copy();
		const ketoneUnderRMgX = reactivityRows(raw).find(
			(r) => r.group === 'ketone' && r.condition === 'organometallic'
		);
		expect(ketoneUnderRMgX?.rating).toBe('reacts');
		expect(buildRuleTable(raw).reactivityOf('ketone', 'organometallic-grignard')?.rating).toBe(
			'reacts'
		);
		reactivityRows(raw).push({
			group: 'ketone',
			condition: 'organometallic-grignard',
			rating: 'none',
			reason: 'A made-up row for the test.',
			source: 'test row'
		});
		const table = buildRuleTable(raw);
		expect(table.reactivityOf('ketone', 'organometallic-grignard')).toBeUndefined();
		expect(table.reactivityOf('ketone', 'organometallic')?.rating).toBe('reacts');
	});

	it('refuse `none` on a broader class, a finer class that refines a finer one, and a missing broader rating', () => {
		const raw = copy();
		reactivityRows(raw).push({
			group: 'ketone',
			condition: 'heat',
			rating: 'none',
			reason: 'x',
			source: 'x'
		});
		const conditions = raw.conditions as { id: string; refines?: string }[];
		conditions.find((c) => c.id === 'oxidant-mild-allylic')!.refines = 'oxidant-mild-primary';
		delete pgRows(raw).find((pg) => pg.id === 'Bn')!.stability['periodate'];
		const problems = problemsOf(raw);
		expect(problems).toEqual(
			expect.arrayContaining([
				expect.stringMatching(
					/reactivity\.json: \[\d+\]\.rating: "none" is only for a finer class/
				),
				expect.stringMatching(
					/conditions\.json: \[\d+\]\.refines: "oxidant-mild-primary" is itself a finer class/
				),
				expect.stringMatching(
					/protecting-groups\.json: \[\d+\]\.stability\.periodate: missing rating/
				)
			])
		);
	});

	it('refine a free group row for named reagents, milder or harsher, and refuse a reagent that cannot bring the class', () => {
		const table = buildRuleTable(copy());
		// Aliphatic tertiary alcohols survive TFA/CH2Cl2 but not hot H2SO4 (common practice).
		expect(table.reactivityOf('alcohol-tertiary', 'acid-strong', ['TFA'])).toBeUndefined();
		expect(table.reactivityOf('alcohol-tertiary', 'acid-strong', ['TFA', 'H2SO4'])?.rating).toBe(
			'caution'
		);
		expect(table.reactivityOf('alcohol-tertiary', 'acid-strong')?.rating).toBe('caution');
		const raw = copy();
		const row = reactivityRows(raw).find(
			(r) => r.group === 'ketone' && r.condition === 'organometallic'
		)!;
		(row as unknown as { reagentRatings: unknown[] }).reagentRatings = [
			{ reagent: 'TBAF', rating: 'none', reason: 'x' },
			{ reagent: 'OG-Zinc 9', rating: 'none', reason: 'x' }
		];
		expect(problemsOf(raw)).toEqual(
			expect.arrayContaining([
				expect.stringMatching(
					/reactivity\.json: \[\d+\]\.reagentRatings\[0\]\.reagent: "TBAF" does not bring organometallic/
				),
				expect.stringMatching(
					/reactivity\.json: \[\d+\]\.reagentRatings\[1\]\.reagent: unknown reagent "OG-Zinc 9"/
				)
			])
		);
	});

	it('let a PG reagent rating be milder than its class (PPTS leaves TBDPS; Miyashita et al., J. Org. Chem. 1977, 42, 3772)', () => {
		const table = buildRuleTable(copy());
		expect(table.stabilityOf('TBDPS', 'acid-mild').rating).toBe('caution');
		expect(table.stabilityOf('TBDPS', 'acid-mild', ['PPTS']).rating).toBe('stable');
		expect(table.stabilityOf('TBDPS', 'acid-mild', ['PPTS', 'CSA']).rating).toBe('caution');
	});
});
