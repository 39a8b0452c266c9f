import { describe, expect, it } from 'vitest';
import {
	buildRuleTable,
	formatPath,
	loadRuleTable,
	parseRuleFiles,
	type RuleOverridesInput
} from '../../src/lib/rules';
import { good, problemsOf } from '../factories/rule-files';

describe('rule-table loader: error messages name file, path and reason', () => {
	it('accepts the bundled files', () => {
		expect(() => parseRuleFiles(good())).not.toThrow();
	});

	it('formats paths the way people read them', () => {
		expect(formatPath([12, 'conditions', 0])).toBe('[12].conditions[0]');
		expect(formatPath([3, 'stability', 'fluoride'])).toBe('[3].stability.fluoride');
		expect(formatPath([])).toBe('(top level)');
	});

	it('rejects a misspelt condition id in a reagent, listing the valid ids', () => {
		const raw = good();
		const list = raw.reagents as { conditions: string[] }[];
		list[12]!.conditions[0] = 'acid-stronk';
		const [problem] = problemsOf(raw);
		expect(problem).toMatch(
			/^rules\/reagents\.json: \[12\]\.conditions\[0\]: unknown condition id "acid-stronk" \(valid: acid-strong, acid-mild, .*heat\)$/
		);
	});

	it('rejects a protecting group with a missing stability cell', () => {
		const raw = good();
		const rows = raw.protectingGroups as { stability: Record<string, string> }[];
		delete rows[2]!.stability.fluoride;
		expect(problemsOf(raw)).toEqual([
			'rules/protecting-groups.json: [2].stability.fluoride: missing rating (every broader condition class needs one: stable, caution or labile)'
		]);
	});

	it('rejects install transforms that leave a protected group undrawn or draw one the row does not protect', () => {
		const raw = good();
		const tbs = (
			raw.protectingGroups as { id: string; install: { transforms: { groups: string[] }[] } }[]
		).find((pg) => pg.id === 'TBS')!;
		tbs.install.transforms[0]!.groups = [
			'alcohol-primary',
			'alcohol-secondary',
			'alcohol-tertiary',
			'thiol'
		];
		const problems = problemsOf(raw);
		expect(problems).toContain(
			'rules/protecting-groups.json: [2].install.transforms: no transforms for "phenol" (each protected group needs exactly one)'
		);
		expect(problems).toContain(
			'rules/protecting-groups.json: [2].install.transforms: a transform for "thiol", which the row does not protect'
		);
	});

	it('rejects a transform that is not one reaction SMARTS', () => {
		const raw = good();
		(
			raw.protectingGroups as { install: { transforms: { smarts: string }[] } }[]
		)[0]!.install.transforms[0]!.smarts = '[O;H1:1]';
		expect(problemsOf(raw)).toEqual([
			expect.stringMatching(
				/^rules\/protecting-groups\.json: \[0\]\.install\.transforms\[0\]\.smarts: must be one reaction SMARTS/
			)
		]);
	});

	it('rejects a stability cell for a condition class that does not exist', () => {
		const raw = good();
		const rows = raw.protectingGroups as { stability: Record<string, string> }[];
		rows[0]!.stability['acid-weird'] = 'stable';
		const [problem] = problemsOf(raw);
		expect(problem).toMatch(
			/^rules\/protecting-groups\.json: \[0\]\.stability: unknown condition id "acid-weird"/
		);
	});

	it('rejects an unknown protecting group id and reports the one it displaced as missing', () => {
		const raw = good();
		const rows = raw.protectingGroups as { id: string }[];
		rows[4]!.id = 'TBDMS';
		const problems = problemsOf(raw);
		expect(problems[0]).toMatch(
			/^rules\/protecting-groups\.json: \[4\]\.id: unknown protecting group id "TBDMS" \(valid: TMS, TES, TBS/
		);
	});

	it('rejects a duplicated protecting group and names both places', () => {
		const raw = good();
		const rows = raw.protectingGroups as { id: string }[];
		rows[1]!.id = 'TMS';
		expect(problemsOf(raw)).toEqual([
			'rules/protecting-groups.json: [1].id: duplicate protecting group "TMS" (first at [0])',
			'rules/protecting-groups.json: (top level): missing protecting group: "TES"'
		]);
	});

	it('rejects an unknown free group in reactivity', () => {
		const raw = good();
		(raw.reactivity as { group: string }[])[5]!.group = 'ketene';
		expect(problemsOf(raw)[0]).toMatch(
			/^rules\/reactivity\.json: \[5\]\.group: unknown free group id "ketene" \(valid: aldehyde, ketone/
		);
	});

	it('rejects a condition class missing from conditions.json', () => {
		const raw = good();
		raw.conditions = (raw.conditions as { id: string }[]).filter((c) => c.id !== 'periodate');
		expect(problemsOf(raw)).toEqual([
			'rules/conditions.json: (top level): missing condition class: "periodate"'
		]);
	});

	it('rejects a spelling claimed by two reagents', () => {
		const raw = good();
		const list = raw.reagents as { name: string; synonyms: string[] }[];
		const nabh4 = list.findIndex((r) => r.name === 'NaBH4');
		list[nabh4]!.synonyms.push('LAH');
		const problem = problemsOf(raw).find((p) => p.includes('LAH'));
		expect(problem).toMatch(
			/^rules\/reagents\.json: \[\d+\]\.synonyms\[\d+\]: "LAH" is already a spelling of "LiAlH4"$/
		);
	});

	it('rejects unknown fields and wrong types, naming each', () => {
		const raw = good();
		(raw.conditions as Record<string, unknown>[])[0]!.colour = 'red';
		(raw.reactivity as Record<string, unknown>[])[0]!.rating = 'explodes';
		const problems = problemsOf(raw);
		expect(problems).toContain('rules/conditions.json: [0]: unknown field "colour"');
		expect(problems).toContain(
			'rules/reactivity.json: [0].rating: unknown reactivity rating "explodes" (valid: reacts, caution, none)'
		);
	});

	it('rejects a true reagent that brings no condition class', () => {
		const raw = good();
		(raw.reagents as { conditions: string[] }[])[0]!.conditions = [];
		expect(problemsOf(raw)).toEqual([
			'rules/reagents.json: [0].conditions: a reagent must bring at least one condition class (or set kind to solvent, additive or workup)'
		]);
	});

	it('throws one error whose message lists the problems', () => {
		const raw = good();
		(raw.reagents as { conditions: string[] }[])[0]!.conditions = ['nope'];
		expect(() => buildRuleTable(raw)).toThrow(
			/rules\/reagents\.json: \[0\]\.conditions\[0\]: unknown condition id "nope"/
		);
	});
});

describe('rule-table override layer', () => {
	it('answers from the defaults when there is no layer', () => {
		const table = loadRuleTable();
		// Fluoride removes TBS (Wuts, Greene's, 5th ed., from memory).
		expect(table.stabilityOf('TBS', 'fluoride')).toMatchObject({
			rating: 'labile',
			layer: 'default'
		});
		expect(table.overrides).toBeNull();
	});

	it('lets a team layer replace a rating without touching the defaults', () => {
		const team = loadRuleTable({
			name: 'Team Kestrel',
			stability: [
				{
					protectingGroup: 'TBS',
					condition: 'acid-mild',
					rating: 'caution',
					reason: 'Our secondary TBS ethers survive PPTS/MeOH at rt.'
				}
			],
			reactivity: [
				{
					group: 'ketone',
					condition: 'hydride-mild',
					rating: 'none',
					reason: 'Hindered ketone; NaBH4 at −78 °C leaves it.'
				},
				{
					group: 'alkene',
					condition: 'lewis-acid',
					rating: 'reacts',
					reason: 'Our trisubstituted alkene cyclises.',
					source: 'Kestrel notebook 14'
				}
			]
		});
		expect(team.stabilityOf('TBS', 'acid-mild')).toEqual({
			rating: 'caution',
			reason: 'Our secondary TBS ethers survive PPTS/MeOH at rt.',
			source: 'Team Kestrel (team override)',
			layer: 'override'
		});
		expect(team.stabilityOf('TBS', 'fluoride').layer).toBe('default');
		expect(team.reactivityOf('ketone', 'hydride-mild')).toBeUndefined();
		expect(team.reactivityOf('alkene', 'lewis-acid')).toMatchObject({
			rating: 'reacts',
			source: 'Kestrel notebook 14',
			layer: 'override'
		});
		expect(team.reactivityOf('ketone', 'organometallic')).toMatchObject({
			rating: 'reacts',
			layer: 'default'
		});

		const plain = loadRuleTable();
		expect(plain.stabilityOf('TBS', 'acid-mild').rating).toBe('labile');
		expect(plain.reactivityOf('ketone', 'hydride-mild')?.rating).toBe('reacts');
	});

	it('rejects a layer with unknown ids or a duplicated cell', () => {
		// A layer read back from the database is untyped JSON; the loader must not trust it.
		const stored = {
			name: 'T',
			stability: [
				{ protectingGroup: 'TBDMS', condition: 'fluoride', rating: 'labile', reason: 'x' }
			]
		} as unknown as RuleOverridesInput;
		expect(() => loadRuleTable(stored)).toThrow(
			/overrides: stability\[0\]\.protectingGroup: unknown protecting group id "TBDMS"/
		);
		const row = {
			protectingGroup: 'Boc',
			condition: 'heat',
			rating: 'labile',
			reason: 'melt'
		} as const;
		expect(() => loadRuleTable({ name: 'T', stability: [row, row] })).toThrow(
			/overrides: stability\[1\]: duplicate stability Boc × heat/
		);
	});

	it('returns a frozen table', () => {
		const table = loadRuleTable();
		expect(Object.isFrozen(table)).toBe(true);
		expect(Object.isFrozen(table.protectingGroups[0]!.stability)).toBe(true);
		expect(() => {
			(table.protectingGroups[0]!.stability as Record<string, string>).fluoride = 'stable';
		}).toThrow(TypeError);
	});
});

describe('rule-table loader: usuallyMasked', () => {
	it('accepts it only on a caution row', () => {
		const raw = good();
		const rows = raw.reactivity as {
			group: string;
			condition: string;
			rating: string;
			usuallyMasked?: boolean;
		}[];
		const index = rows.findIndex((r) => r.rating === 'reacts');
		rows[index]!.usuallyMasked = true;
		expect(problemsOf(raw)).toEqual([
			`rules/reactivity.json: [${index}].usuallyMasked: only a caution row can say the group is usually masked (a reacts row always is)`
		]);
	});
});
