import type { RouteDocument } from '../../route/document';
import {
	planRoute,
	type CheckedPlanAnswer,
	type Plan,
	type PlanSafety,
	type SavedConditionEntry
} from '../../rules/plan';
import type { RuleOverridesInput } from '../../rules/overrides';
import { checkRouteDocument, rulesFor, type RouteStepCheck } from './check';

/**
 * What a route's team brings to its plans, both plain JSON for the chemistry worker: its rule
 * overrides (`teamRuleLayer`) and its approved saved conditions (`approvedSavedConditions`).
 */
export type TeamPlanning = {
	layer?: RuleOverridesInput;
	savedConditions?: readonly SavedConditionEntry[];
};

/** The first clash or unreadable step of a route, or null when it re-checks clean. */
export function firstClash(route: RouteDocument): string | null {
	return firstClashIn(checkRouteDocument(route));
}

function firstClashIn(checks: RouteStepCheck[]): string | null {
	for (const step of checks) {
		if (step.error) {
			return `step "${step.id}": ${step.error.message}`;
		}
		const clash = step.clashes.find((c) => c.severity === 'clash');
		if (clash) {
			return `step "${step.id}": ${clash.message}`;
		}
	}
	return null;
}

/**
 * Plans a route with the default rule table, or under a team's layer, every plan re-checked
 * through `checkRouteDocument` with the same table, and says for each plan which hazards its added
 * steps bring, which cautions remain and which reagent text it could not judge. The added steps
 * follow the team's saved conditions where the re-check allows.
 */
export function planRouteDocument(
	document: RouteDocument,
	{ layer, savedConditions = [] }: TeamPlanning = {}
): CheckedPlanAnswer {
	const { table, rules } = rulesFor(layer);
	// The re-check that admits each plan also gives its hazards and cautions: keep it, by route.
	const checked = new WeakMap<RouteDocument, RouteStepCheck[]>();
	const verify = (route: RouteDocument) => {
		const checks = checkRouteDocument(route, rules);
		checked.set(route, checks);
		return firstClashIn(checks);
	};
	const answer = planRoute(document, { verify, table, rules, savedConditions });
	return {
		...answer,
		plans: answer.plans.map((plan) => ({
			...plan,
			...safetyOf(plan, checked.get(plan.route) ?? checkRouteDocument(plan.route, rules))
		}))
	};
}

function safetyOf(plan: Plan, checks: RouteStepCheck[]): PlanSafety {
	const added = new Set(
		plan.route.steps
			.filter((s) => s.intent === 'protect' || s.intent === 'deprotect')
			.map((s) => s.id)
	);
	return {
		hazards: checks
			.filter((c) => added.has(c.id))
			.flatMap((c) => c.hazards.map((h) => ({ step: c.id, reagent: h.reagent, note: h.note }))),
		cautions: checks.flatMap((c) =>
			c.clashes
				.filter((x) => x.severity === 'caution')
				.map((x) => ({ step: c.id, message: x.message }))
		),
		unrecognized: checks
			.filter((c) => c.unrecognized.length)
			.map((c) => ({ step: c.id, text: c.unrecognized }))
	};
}
