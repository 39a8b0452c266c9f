import {
	checkStep,
	StepStructureError,
	UnknownConditionError,
	type CheckRules,
	type StepCheck,
	type StepToCheck
} from '../../rules/check';
import { checkRulesFrom } from '../../rules/check/rules-adapter';
import type { RuleOverridesInput } from '../../rules/overrides';
import { loadRuleTable, type RuleTable } from '../../rules/table';
import type { RouteDocument } from '../../route/document';
import { codeForStructure } from '../chem-pool/refusals';

let defaults: CheckRules | null = null;

/** The default rule table in the check's view, built once per process. */
export function defaultCheckRules(): CheckRules {
	defaults ??= checkRulesFrom();
	return defaults;
}

/** A rule table and the check's view of it: the planner reads both. */
export type LayeredRules = { table: RuleTable; rules: CheckRules };

// Layered tables built in this worker, by the layer's JSON. A cache only (the layer itself comes
// from the database with every task, so an edited override is a new key); small, because a table
// view keeps its remembered answers, and a team's checks come in runs.
const LAYERED_TABLES = 8;
const layered = new Map<string, LayeredRules>();

/**
 * The defaults, or the table under a team's layer, e.g. `rulesFor({ name: 'Kestrel', stability:
 * [...] })`. A layer that does not fit the table throws OverrideLayerError (a 422 refusal).
 */
export function rulesFor(layer?: RuleOverridesInput): LayeredRules {
	if (!layer) {
		return { table: loadRuleTable(), rules: defaultCheckRules() };
	}
	const key = JSON.stringify(layer);
	const known = layered.get(key);
	if (known) {
		// Most recently used last, so the oldest is the one dropped.
		layered.delete(key);
		layered.set(key, known);
		return known;
	}
	const table = loadRuleTable(layer);
	const built = { table, rules: checkRulesFrom(table) };
	if (layered.size >= LAYERED_TABLES) {
		layered.delete(layered.keys().next().value!);
	}
	layered.set(key, built);
	return built;
}

/** Checks steps in order; the first unreadable structure or unknown condition id throws. */
export function checkSteps(steps: StepToCheck[], rules = defaultCheckRules()): StepCheck[] {
	return steps.map((step) => checkStep(rules, step));
}

/** A route step's answer: the same type as `/api/check`'s, whose `error` a route step may carry. */
export type RouteStepCheck = StepCheck;

/**
 * Checks every step of a route document. A step that cannot be checked (an empty or unreadable
 * structure while the chemist is still drawing) reports its problem instead of failing the route,
 * and still lists the reagent text nobody recognised: that does not depend on the structures.
 */
export function checkRouteDocument(
	document: RouteDocument,
	rules = defaultCheckRules()
): RouteStepCheck[] {
	const structures = new Map(document.intermediates.map((node) => [node.id, node.structure]));
	return document.steps.map((step) => {
		try {
			return checkStep(rules, {
				id: step.id,
				substrate: step.from.map((id) => structures.get(id) ?? ''),
				product: structures.get(step.to) ?? '',
				conditions: step.conditions,
				reagents: step.reagents
			});
		} catch (caught) {
			const error = stepErrorOf(caught);
			if (!error) {
				throw caught;
			}
			const classified = step.reagents?.trim() ? rules.classify(step.reagents) : null;
			return {
				id: step.id,
				conditions: step.conditions ?? [],
				hazards: classified?.hazards ?? [],
				clashes: [],
				unrecognized: classified?.unknown ?? [],
				error
			};
		}
	});
}

/** The per-step `error` for a step the check refused, or null for a bug (which is thrown on). */
function stepErrorOf(caught: unknown): StepCheck['error'] | null {
	if (caught instanceof StepStructureError) {
		return { code: codeForStructure(caught.reason), message: caught.problem };
	}
	if (caught instanceof UnknownConditionError) {
		return { code: 'unknown_condition', message: caught.problem };
	}
	return null;
}
