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
		if (error instanceof RuleTableError) return [...error.problems];
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
});
