import { describe, expect, it } from 'vitest';
import conditionsFile from '../../rules/conditions.json';
import {
	CONDITION_IDS,
	FREE_GROUP_IDS,
	loadRuleTable,
	PROTECTING_GROUP_IDS,
	STABILITY_RATINGS
} from '../../src/lib/rules';
import { OXYGEN_PG_IDS } from '../factories/pg-ids';

// Consistency of the bundled rule table with itself (DEVELOPERS.md, "Adding a rule").
const table = loadRuleTable();
const finerOf = (id: string) => table.conditions.filter((c) => c.refines === id).map((c) => c.id);
const readsAs = (read: readonly string[], id: string) =>
	read.includes(id as never) || finerOf(id).some((f) => read.includes(f as never));

describe('rule table: ids and coverage', () => {
	it('defines every condition class once, in the fixed order: 25 broader classes and the finer ones inside them', () => {
		expect(table.conditions.map((c) => c.id)).toEqual([...CONDITION_IDS]);
		expect(table.conditions.filter((c) => !c.refines)).toHaveLength(25);
		for (const finer of table.conditions.filter((c) => c.refines)) {
			// A finer class keeps its broader class's name as a prefix, so old ids still read right.
			expect(finer.id.startsWith(`${finer.refines}-`), finer.id).toBe(true);
		}
	});

	it('rates each protecting group once, the oxygen PGs of issue 11 included', () => {
		// Pinned by id, not by total: other parts of issue 11 add PGs too.
		expect(PROTECTING_GROUP_IDS).toEqual(expect.arrayContaining(OXYGEN_PG_IDS));
		expect(new Set(PROTECTING_GROUP_IDS).size).toBe(PROTECTING_GROUP_IDS.length);
		expect(PROTECTING_GROUP_IDS).toEqual(
			expect.arrayContaining(['Boc', 'Ns', 'Troc', 'Teoc', 'N-Bn', 'acetamide'])
		);
		expect(PROTECTING_GROUP_IDS).toEqual(
			expect.arrayContaining(['trifluoroacetamide', 'TIPS-alkyne', 'TES-alkyne', 'S-Ac'])
		);
		expect(PROTECTING_GROUP_IDS).toEqual(expect.arrayContaining(['MIDA-boronate', 'Bdan']));
		expect([...table.protectingGroups.map((pg) => pg.id)].sort()).toEqual(
			[...PROTECTING_GROUP_IDS].sort()
		);
	});

	it('has at least 45 protecting groups and 250 reagents (issue 11)', () => {
		expect(table.protectingGroups.length).toBeGreaterThanOrEqual(45);
		expect(table.reagents.length).toBeGreaterThanOrEqual(250);
	});

	it('rates every protecting group under every condition class (finer classes by inheritance where not rated)', () => {
		for (const pg of table.protectingGroups) {
			for (const condition of table.conditions) {
				if (!condition.refines) {
					expect(STABILITY_RATINGS, `${pg.id} × ${condition.id}`).toContain(
						pg.stability[condition.id]
					);
				}
				expect(STABILITY_RATINGS, `${pg.id} × ${condition.id}`).toContain(
					table.ratingsOf(pg.id)[condition.id]
				);
			}
		}
	});

	it('rates only known free groups, each pair once', () => {
		const pairs = table.reactivity.map((r) => `${r.group}|${r.condition}`);
		expect(new Set(pairs).size).toBe(pairs.length);
		for (const entry of table.reactivity) {
			expect(FREE_GROUP_IDS).toContain(entry.group);
		}
	});

	it('gives every free group at least one reactivity entry', () => {
		const rated = new Set(table.reactivity.map((r) => r.group));
		expect(FREE_GROUP_IDS.filter((g) => !rated.has(g))).toEqual([]);
	});

	it('names a source on every protecting-group row and reactivity entry', () => {
		for (const row of [...table.protectingGroups, ...table.reactivity]) {
			expect(row.source).toMatch(/from memory|common practice/);
		}
	});
});

describe('rule table: protecting groups come off the way their rows say', () => {
	for (const pg of table.protectingGroups) {
		it(`${pg.id} is labile under at least one condition of each of its removal methods`, () => {
			for (const method of pg.remove) {
				// Labile by class, or by a reagent-level rating for a reagent the method names.
				const named = method.reagents.flatMap((text) =>
					table.conditionsForReagents(text).matched.map((m) => m.reagent)
				);
				const labile = method.conditions.filter(
					(c) =>
						pg.stability[c] === 'labile' || table.stabilityOf(pg.id, c, named).rating === 'labile'
				);
				expect(labile, `${pg.id}: ${method.reagents.join(' | ')}`).not.toEqual([]);
			}
		});

		it(`${pg.id}: its install and removal reagents read as the conditions listed`, () => {
			for (const method of [...pg.install.methods, ...pg.remove]) {
				const reads = method.reagents.map((text) => table.conditionsForReagents(text));
				for (const [i, read] of reads.entries()) {
					const reagents = method.reagents[i];
					expect(read.unknown, reagents).toEqual([]);
					// A listed class is read as itself or as a finer class inside it (n-BuLi and EtMgBr
					// both bring `organometallic`; EtMgBr the finer `organometallic-grignard`).
					for (const c of method.conditions) {
						expect(readsAs(read.conditions, c), `${reagents}: ${c}`).toBe(true);
					}
				}
				// A broader class that every recipe reads as one finer class should name that class.
				for (const c of method.conditions) {
					const finer = finerOf(c).filter((f) => reads.every((r) => r.conditions.includes(f)));
					expect(finer, `${pg.id}: ${method.reagents.join(' | ')} lists ${c}`).toEqual([]);
				}
			}
		});

		it(`${pg.id}: each install recipe brings no class its method does not list (issue 12)`, () => {
			// The planner offers recipes method by method, so recipes that bring different classes
			// (TBSCl, imidazole vs TBSOTf, 2,6-lutidine, a Lewis acid too) must be separate methods.
			const broaderOf = new Map(table.conditions.map((c) => [c.id as string, c.refines]));
			for (const method of pg.install.methods) {
				const listed = new Set<string>(method.conditions);
				for (const text of method.reagents) {
					const unlisted = table
						.conditionsForReagents(text)
						.conditions.filter((c) => !listed.has(c) && !listed.has(broaderOf.get(c) ?? ''));
					expect(unlisted, `${pg.id}: ${text}`).toEqual([]);
				}
			}
		});
	}
});

describe('rule table: reagents', () => {
	it('lists at least 150 reagents, at least 40 of them with hazard notes', () => {
		expect(table.reagents.length).toBeGreaterThanOrEqual(150);
		expect(table.reagents.filter((r) => r.hazard).length).toBeGreaterThanOrEqual(40);
	});

	it('maps every reagent to known condition classes, and every true reagent to at least one', () => {
		for (const reagent of table.reagents) {
			for (const c of reagent.conditions) {
				expect(CONDITION_IDS).toContain(c);
			}
			if (reagent.kind === 'reagent') {
				expect(reagent.conditions.length, reagent.name).toBeGreaterThan(0);
			}
		}
	});

	it('ends every hazard note by deferring to the SDS and institutional safety rules', () => {
		for (const reagent of table.reagents) {
			if (reagent.hazard) {
				expect(reagent.hazard, reagent.name).toMatch(
					/SDS and follow your institution’s safety rules/
				);
			}
		}
	});

	it('recognises each of its own spellings as that reagent', () => {
		for (const reagent of table.reagents) {
			for (const spelling of [reagent.name, ...reagent.synonyms]) {
				const read = table.conditionsForReagents(spelling);
				expect(
					read.matched.map((m) => m.reagent),
					spelling
				).toEqual([reagent.name]);
			}
		}
	});

	it('classifies every example of a finer class as that class', () => {
		for (const condition of conditionsFile.filter((c) => 'refines' in c)) {
			for (const example of condition.examples) {
				expect(table.conditionsForReagents(example).conditions, example).toContain(condition.id);
			}
		}
	});

	it('classifies every example of a broader class as that class or a finer class inside it', () => {
		// "NaH" is `base-strong-hydride`, which sits inside (and inherits from) `base-strong`.
		for (const condition of conditionsFile.filter((c) => !('refines' in c))) {
			for (const example of condition.examples) {
				const read = table.conditionsForReagents(example).conditions;
				expect(readsAs(read, condition.id), `${example}: ${read.join(', ')}`).toBe(true);
			}
		}
	});
});
