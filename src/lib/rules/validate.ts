/**
 * Validation of the rule files as a whole: each file against its schema, then the checks that
 * span files (every condition class defined once, every protecting group rated once, no reagent
 * spelling claimed twice). All problems are collected and reported together.
 */
import type { z } from 'zod';
import { CONDITION_IDS, PROTECTING_GROUP_IDS } from './ids';
import { formatIssue, formatZodIssues, RuleTableError, RULE_FILES } from './issues';
import { checkReactivityReagentRatings, checkReagentRatings } from './validate-reagent-ratings';
import { checkInstallMethods, checkPreferences } from './validate-planning';
import { spellingKey } from './spelling';
import {
	conditionsFileSchema,
	preferencesFileSchema,
	protectingGroupConditionsFileSchema,
	reactivityFileSchema,
	reagentsFileSchema,
	type Condition,
	type Preference,
	type ProtectingGroupConditions,
	type ReactivityEntry,
	type Reagent
} from './schemas';

export { RULE_FILES };
export type RuleFileKey = keyof typeof RULE_FILES;
export type RawRuleFiles = Record<RuleFileKey, unknown>;

export interface RuleData {
	conditions: Condition[];
	reagents: Reagent[];
	reactivity: ReactivityEntry[];
	protectingGroups: ProtectingGroupConditions[];
	preferences: Preference[];
}

function parseFile<S extends z.ZodType>(schema: S, file: string, raw: unknown, problems: string[]) {
	const result = schema.safeParse(raw);
	if (result.success) {
		return result.data as z.output<S>;
	}
	problems.push(...formatZodIssues(file, result.error));
	return undefined;
}

/** Reports ids of a fixed list that a file defines twice or not at all. */
function checkEachOnce(
	file: string,
	what: string,
	expected: readonly string[],
	ids: readonly string[],
	problems: string[]
) {
	const firstIndex = new Map<string, number>();
	ids.forEach((id, index) => {
		if (firstIndex.has(id)) {
			problems.push(
				formatIssue(
					file,
					[index, 'id'],
					`duplicate ${what} "${id}" (first at [${firstIndex.get(id)}])`
				)
			);
		} else {
			firstIndex.set(id, index);
		}
	});
	const missing = expected.filter((id) => !firstIndex.has(id));
	if (missing.length > 0) {
		problems.push(
			formatIssue(file, [], `missing ${what}: ${missing.map((id) => `"${id}"`).join(', ')}`)
		);
	}
}

function checkReagentSpellings(reagents: readonly Reagent[], problems: string[]) {
	const owner = new Map<string, string>();
	reagents.forEach((reagent, index) => {
		const exactCase = new Set(reagent.exactCase ?? []);
		const spellings: [string, PropertyKey[]][] = [
			[reagent.name, [index, 'name']],
			...reagent.synonyms.map((s, i): [string, PropertyKey[]] => [s, [index, 'synonyms', i]])
		];
		for (const [spelling, path] of spellings) {
			// Formulas keep their case (CoCl2 is not COCl2); names fold.
			const key = spellingKey(spelling, exactCase.has(spelling.trim()));
			const previous = owner.get(key);
			if (previous !== undefined && previous !== reagent.name) {
				problems.push(
					formatIssue(
						RULE_FILES.reagents,
						path,
						`"${spelling}" is already a spelling of "${previous}"`
					)
				);
			} else {
				owner.set(key, reagent.name);
			}
		}
	});
}

function checkReactivityPairs(entries: readonly ReactivityEntry[], problems: string[]) {
	const seen = new Map<string, number>();
	entries.forEach((entry, index) => {
		const key = `${entry.group} × ${entry.condition}`;
		const first = seen.get(key);
		if (first !== undefined) {
			problems.push(
				formatIssue(RULE_FILES.reactivity, [index], `duplicate pair ${key} (first at [${first}])`)
			);
		} else {
			seen.set(key, index);
		}
	});
}

/** Validates raw file contents, e.g. `parseRuleFiles({ conditions, reagents, reactivity, protectingGroups })`. */
export function parseRuleFiles(raw: RawRuleFiles): RuleData {
	const problems: string[] = [];
	const conditions = parseFile(
		conditionsFileSchema,
		RULE_FILES.conditions,
		raw.conditions,
		problems
	);
	const reagents = parseFile(reagentsFileSchema, RULE_FILES.reagents, raw.reagents, problems);
	const reactivity = parseFile(
		reactivityFileSchema,
		RULE_FILES.reactivity,
		raw.reactivity,
		problems
	);
	const protectingGroups = parseFile(
		protectingGroupConditionsFileSchema,
		RULE_FILES.protectingGroups,
		raw.protectingGroups,
		problems
	);
	const preferences = parseFile(
		preferencesFileSchema,
		RULE_FILES.preferences,
		raw.preferences,
		problems
	);

	// Other files name condition classes through the schema's enum; this makes sure each of those
	// ids is also defined (label, description) in conditions.json, so every reference resolves.
	if (conditions) {
		checkEachOnce(
			RULE_FILES.conditions,
			'condition class',
			CONDITION_IDS,
			conditions.map((c) => c.id),
			problems
		);
	}
	if (protectingGroups) {
		const ids = protectingGroups.map((pg) => pg.id);
		checkEachOnce(
			RULE_FILES.protectingGroups,
			'protecting group',
			PROTECTING_GROUP_IDS,
			ids,
			problems
		);
	}
	if (conditions) {
		checkRefinements(conditions, problems);
	}
	if (conditions && protectingGroups) {
		checkBroadRatings(conditions, protectingGroups, problems);
	}
	if (conditions && reactivity) {
		checkNoneRows(conditions, reactivity, problems);
	}
	if (reagents) {
		checkReagentSpellings(reagents, problems);
	}
	if (reagents) {
		checkContextTags(reagents, problems);
	}
	if (reagents && protectingGroups) {
		checkReagentRatings(protectingGroups, reagents, problems);
	}
	if (reagents && reactivity && conditions) {
		checkReactivityReagentRatings(reactivity, reagents, conditions, problems);
	}
	if (protectingGroups) {
		checkTransformCoverage(protectingGroups, problems);
	}
	if (reactivity) {
		checkReactivityPairs(reactivity, problems);
	}
	if (protectingGroups) {
		checkInstallMethods(protectingGroups, problems);
	}
	if (protectingGroups && preferences) {
		checkPreferences(protectingGroups, preferences, problems);
	}

	if (
		problems.length > 0 ||
		!conditions ||
		!reagents ||
		!reactivity ||
		!protectingGroups ||
		!preferences
	) {
		throw new RuleTableError(problems);
	}
	return { conditions, reagents, reactivity, protectingGroups, preferences };
}

/** A `when` tag that no reagent carries could never apply: a typo, or a tag not yet given out. */
function checkContextTags(reagents: readonly Reagent[], problems: string[]) {
	const carried = new Set(reagents.flatMap((r) => r.tags ?? []));
	reagents.forEach((reagent, index) => {
		(reagent.when ?? []).forEach((entry, i) => {
			if (!carried.has(entry.tag)) {
				problems.push(
					formatIssue(
						RULE_FILES.reagents,
						[index, 'when', i, 'tag'],
						`no reagent carries the tag "${entry.tag}", so this context never applies`
					)
				);
			}
		});
	});
}

/** Every group a PG protects is drawn by exactly one of its install transforms, and no other group is. */
function checkTransformCoverage(pgs: ProtectingGroupConditions[], problems: string[]) {
	pgs.forEach((pg, index) => {
		// `protects` belongs to the row's perception half (loose here; chem/patterns.ts validates it).
		const protects = (pg as { protects?: unknown }).protects;
		if (!Array.isArray(protects)) {
			return;
		}
		const drawn = pg.install.transforms.flatMap((t) => t.groups);
		const where = [index, 'install', 'transforms'];
		for (const group of protects) {
			const count = drawn.filter((g) => g === group).length;
			if (count !== 1) {
				problems.push(
					formatIssue(
						RULE_FILES.protectingGroups,
						where,
						`${count === 0 ? 'no' : count} transforms for "${group}" (each protected group needs exactly one)`
					)
				);
			}
		}
		for (const group of new Set(drawn)) {
			if (!protects.includes(group)) {
				problems.push(
					formatIssue(
						RULE_FILES.protectingGroups,
						where,
						`a transform for "${group}", which the row does not protect`
					)
				);
			}
		}
	});
}

/** A finer class sits in a broader one, one level deep: `organometallic-grignard` → `organometallic`. */
function checkRefinements(conditions: Condition[], problems: string[]) {
	const refines = new Map(conditions.map((c) => [c.id, c.refines]));
	conditions.forEach((condition, index) => {
		if (!condition.refines) {
			return;
		}
		const where = [index, 'refines'];
		if (condition.refines === condition.id) {
			problems.push(formatIssue(RULE_FILES.conditions, where, 'a class cannot refine itself'));
		} else if (refines.get(condition.refines)) {
			problems.push(
				formatIssue(
					RULE_FILES.conditions,
					where,
					`"${condition.refines}" is itself a finer class; refine its broader class "${refines.get(condition.refines)}"`
				)
			);
		}
	});
}

/** Every protecting group rates every broader class; finer classes inherit where they are not rated. */
function checkBroadRatings(
	conditions: Condition[],
	pgs: ProtectingGroupConditions[],
	problems: string[]
) {
	const broad = conditions.filter((c) => !c.refines).map((c) => c.id);
	pgs.forEach((pg, index) => {
		for (const id of broad) {
			if (pg.stability[id] === undefined) {
				problems.push(
					formatIssue(
						RULE_FILES.protectingGroups,
						[index, 'stability', id],
						'missing rating (every broader condition class needs one: stable, caution or labile)'
					)
				);
			}
		}
	});
}

/** `none` only makes sense where a broader class's row could otherwise be inherited. */
function checkNoneRows(conditions: Condition[], rows: ReactivityEntry[], problems: string[]) {
	const finer = new Set(conditions.filter((c) => c.refines).map((c) => c.id));
	rows.forEach((row, index) => {
		if (row.rating === 'none' && !finer.has(row.condition)) {
			problems.push(
				formatIssue(
					RULE_FILES.reactivity,
					[index, 'rating'],
					`"none" is only for a finer class (${row.condition} refines nothing; leave the pair out instead)`
				)
			);
		}
	});
}
