import type { RouteDocument } from '../../route/document';
import {
	planRoute,
	type CheckedPlanAnswer,
	type Plan,
	type PlanSafety,
	type SavedConditionEntry
} from '../../rules/plan';
import { checkRouteDocument, defaultCheckRules, type RouteStepCheck } from './check';

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
 * Plans a route with the default rule table, every plan re-checked through `checkRouteDocument`,
 * and says for each plan which hazards its added steps bring, which cautions remain and which
 * reagent text it could not judge. `savedConditions` are the route's team's approved entries
 * (`approvedSavedConditions`), which the added steps follow where the re-check allows.
 */
export function planRouteDocument(
	document: RouteDocument,
	savedConditions: readonly SavedConditionEntry[] = []
): CheckedPlanAnswer {
	// The re-check that admits each plan also gives its hazards and cautions: keep it, by route.
	const checked = new WeakMap<RouteDocument, RouteStepCheck[]>();
	const verify = (route: RouteDocument) => {
		const checks = checkRouteDocument(route);
		checked.set(route, checks);
		return firstClashIn(checks);
	};
	const answer = planRoute(document, { verify, rules: defaultCheckRules(), savedConditions });
	return {
		...answer,
		plans: answer.plans.map((plan) => ({
			...plan,
			...safetyOf(plan, checked.get(plan.route) ?? checkRouteDocument(plan.route))
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
