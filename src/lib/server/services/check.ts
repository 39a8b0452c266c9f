import { checkStep, StepStructureError, UnknownConditionError, type CheckRules, type StepCheck, type StepToCheck } from '../../rules/check';
import { checkRulesFrom } from '../../rules/check/rules-adapter';
import type { RouteDocument } from '../../route/document';

let defaults: CheckRules | null = null;

/** The default rule table in the check's view, built once per process. */
export function defaultCheckRules(): CheckRules {
	defaults ??= checkRulesFrom();
	return defaults;
}

/** Checks steps in order; the first unreadable structure or unknown condition id throws. */
export function checkSteps(steps: StepToCheck[], rules = defaultCheckRules()): StepCheck[] {
	return steps.map((step) => checkStep(rules, step));
}

export type RouteStepCheck = StepCheck & { error?: { code: string; message: string } };

/**
 * Checks every step of a route document. A step that cannot be checked (an empty or unreadable
 * structure while the chemist is still drawing) reports its problem instead of failing the route.
 */
export function checkRouteDocument(document: RouteDocument, rules = defaultCheckRules()): RouteStepCheck[] {
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
			if (caught instanceof StepStructureError || caught instanceof UnknownConditionError) {
				const code = caught instanceof StepStructureError ? 'invalid_structure' : 'unknown_condition';
				return { id: step.id, conditions: step.conditions ?? [], hazards: [], clashes: [], error: { code, message: caught.message } };
			}
			throw caught;
		}
	});
}
