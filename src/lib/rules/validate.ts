/**
 * Validation of the rule files as a whole: each file against its schema, then the checks that
 * span files (every condition class defined once, every protecting group rated once, no reagent
 * spelling claimed twice). All problems are collected and reported together. The checks live in
 * validate-classes.ts, validate-reagents.ts, validate-reagent-ratings.ts and validate-planning.ts.
 */
import type { z } from 'zod';
import { formatIssue, formatZodIssues, RuleTableError, RULE_FILES } from './issues';
import { CONDITION_IDS, PROTECTING_GROUP_IDS } from './ids';
import {
	checkBroadRatings,
	checkEachOnce,
	checkNoneRows,
	checkReactivityPairs,
	checkRefinements
} from './validate-classes';
import { checkContextTags, checkReagentSpellings } from './validate-reagents';
import { checkReactivityReagentRatings, checkReagentRatings } from './validate-reagent-ratings';
import { checkInstallMethods, checkPreferences } from './validate-planning';
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
