import { describe, expect, it } from 'vitest';
import { perceptionRules } from '../../src/lib/chem/patterns';
import { loadRuleTable, type InstallMethod, type RawRuleFiles } from '../../src/lib/rules';
import { preferenceRank } from '../../src/lib/rules/preferences';
import { good, problemsOf } from '../factories/rule-files';

// The data the planner ranks and installs by (issue 12), part one: the loader's cross-checks and
// the preferences (install recipes, drawbacks and concerns: rules-install-recipes.test.ts). Each
// fact's source is named beside its check.

const table = loadRuleTable();
const protects = new Map(perceptionRules().protectingGroups.map((pg) => [pg.id, pg.protects]));

type RawPg = { id: string; install: { methods: Partial<InstallMethod>[] }; drawbacks?: unknown[] };
const rawPgs = (raw: RawRuleFiles) => raw.protectingGroups as RawPg[];
const rawPrefs = (raw: RawRuleFiles) => raw.preferences as { groups: string[]; order: string[] }[];
const pgRow = (id: string) => table.protectingGroups.find((pg) => pg.id === id)!;
/** The groups a recipe takes: its `takes`, else every group its PG's transforms draw. */
const takes = (id: string, m: InstallMethod) =>
	m.takes ?? pgRow(id).install.transforms.flatMap((t) => t.groups);
const rank = (group: string, pg: string) => preferenceRank(table, group, pg);

describe('loader: planning data is cross-checked, with file and path', () => {
	it('refuses a preference row listing a PG that does not protect its groups', () => {
		const raw = good();
		const row = rawPrefs(raw).findIndex((r) => r.groups.includes('alcohol-primary'));
		const at = rawPrefs(raw)[row]!.order.push('Boc') - 1;
		expect(problemsOf(raw)).toEqual([
			`rules/preferences.json: [${row}].order[${at}]: Boc does not protect "alcohol-primary", "alcohol-secondary"`
		]);
	});

	it('refuses a preference PG that no install recipe can put on the group (Fmoc on an indole N–H)', () => {
		const raw = good();
		const row = rawPrefs(raw).findIndex((r) => r.groups.includes('indole-nh'));
		const at = rawPrefs(raw)[row]!.order.push('Fmoc') - 1;
		expect(problemsOf(raw)).toEqual([
			`rules/preferences.json: [${row}].order[${at}]: no install recipe of Fmoc takes "indole-nh"`
		]);
	});

	it('refuses a group type with two preference rows', () => {
		const raw = good();
		rawPrefs(raw).push({
			groups: ['ketone'],
			order: ['dioxane'],
			reason: 'x',
			source: 'x'
		} as never);
		const first = rawPrefs(raw).findIndex((r) => r.groups.includes('ketone'));
		expect(problemsOf(raw)).toEqual([
			`rules/preferences.json: [${rawPrefs(raw).length - 1}].groups[0]: "ketone" already has a preference row ([${first}])`
		]);
	});

	it('refuses a `prefers` group the recipe does not take (TBSCl, imidazole leaves a tertiary alcohol)', () => {
		const raw = good();
		const index = rawPgs(raw).findIndex((pg) => pg.id === 'TBS');
		rawPgs(raw)[index]!.install.methods[0]!.prefers = [
			{ group: 'alcohol-primary', over: ['alcohol-tertiary'], reason: 'x' }
		];
		expect(problemsOf(raw)).toEqual([
			`rules/protecting-groups.json: [${index}].install.methods[0].prefers[0]: "alcohol-tertiary" is not a group this recipe takes`
		]);
	});

	it('refuses a recipe that prefers a group over itself', () => {
		const raw = good();
		const index = rawPgs(raw).findIndex((pg) => pg.id === 'dioxolane');
		rawPgs(raw)[index]!.install.methods[0]!.prefers = [
			{ group: 'ketone', over: ['ketone'], reason: 'x' }
		];
		expect(problemsOf(raw)).toEqual([
			`rules/protecting-groups.json: [${index}].install.methods[0].prefers[0]: "ketone" cannot be preferred over itself`
		]);
	});

	it('refuses a recipe that takes a group its PG cannot draw', () => {
		const raw = good();
		const index = rawPgs(raw).findIndex((pg) => pg.id === 'Boc');
		rawPgs(raw)[index]!.install.methods[1]!.takes = ['amine-primary', 'alcohol-primary'];
		expect(problemsOf(raw)).toEqual([
			`rules/protecting-groups.json: [${index}].install.methods[1].takes[1]: "alcohol-primary" is not drawn by any of Boc's install transforms`
		]);
	});

	it('refuses an unknown drawback kind and an unknown reagent concern', () => {
		const raw = good();
		rawPgs(raw)[0]!.drawbacks = [{ kind: 'smelly', note: 'x' }];
		(raw.reagents as { concerns?: string[] }[])[0]!.concerns = ['expensive'];
		const problems = problemsOf(raw).join('\n');
		expect(problems).toMatch(
			/protecting-groups\.json: \[0\]\.drawbacks\[0\]\.kind: unknown drawback/
		);
		expect(problems).toMatch(/reagents\.json: \[0\]\.concerns\[0\]: unknown reagent concern/);
	});
});

describe('preferences: a chemist’s first reach per group type, sourced', () => {
	it('has one row for every group type a PG can be installed on, each PG in it installable there', () => {
		const installable = new Set(
			table.protectingGroups.flatMap((pg) => pg.install.methods.flatMap((m) => takes(pg.id, m)))
		);
		const rowed = new Set(table.preferences.flatMap((r) => r.groups as readonly string[]));
		expect([...installable].filter((g) => !rowed.has(g))).toEqual([]);
		for (const row of table.preferences) {
			expect(row.source).toMatch(/from memory|common practice/);
			for (const group of row.groups) {
				for (const pg of row.order) {
					expect(protects.get(pg), `${pg} on ${group}`).toContain(group);
					// A listed PG with no recipe for the group could never be offered for it.
					const recipes = pgRow(pg).install.methods.filter((m) => takes(pg, m).includes(group));
					expect(recipes.length, `${pg} recipes for ${group}`).toBeGreaterThan(0);
				}
			}
		}
	});

	it('puts TBS before TES before TMS for a primary or secondary alcohol — Greene’s 5th ed., ch. 2 (from memory)', () => {
		for (const group of ['alcohol-primary', 'alcohol-secondary']) {
			expect(rank(group, 'TBS')).toBe(0);
			expect(rank(group, 'TBS')).toBeLessThan(rank(group, 'TES'));
			expect(rank(group, 'TES')).toBeLessThan(rank(group, 'TMS'));
			// THP's diastereomers and MOMCl's carcinogen are drawbacks; the preference agrees.
			expect(rank(group, 'TBS')).toBeLessThan(rank(group, 'THP'));
		}
	});

	it('puts the ethylene ketal before the dioxane, the dimethyl ketal and the dithiane for a ketone — Greene’s 5th ed., ch. 4 (from memory)', () => {
		const order = ['dioxolane', 'dioxane', 'dimethyl-acetal', 'dithiane'].map((pg) =>
			rank('ketone', pg)
		);
		expect(order).toEqual([0, 1, 2, 3]);
	});

	it('puts Boc before Cbz before Fmoc for an amine and the acetonide first for a 1,2-diol — Greene’s 5th ed., ch. 7 and ch. 2 (from memory)', () => {
		for (const group of ['amine-primary', 'amine-secondary', 'aniline']) {
			expect([rank(group, 'Boc'), rank(group, 'Cbz'), rank(group, 'Fmoc')]).toEqual([0, 1, 2]);
		}
		expect(rank('diol-1,2', 'acetonide')).toBe(0);
		expect(rank('carboxylic-acid', 'methyl-ester')).toBe(0);
	});
});
