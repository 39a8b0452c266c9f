import type { RouteDocument } from '../../route/document';
import { planRoute, type CheckedPlanAnswer, type Plan, type PlanSafety } from '../../rules/plan';
import { checkRouteDocument, defaultCheckRules } from './check';

/** The first clash or unreadable step of a route, or null when it re-checks clean. */
export function firstClash(route: RouteDocument): string | null {
	for (const step of checkRouteDocument(route)) {
		if (step.error) return `step "${step.id}": ${step.error.message}`;
		const clash = step.clashes.find((c) => c.severity === 'clash');
		if (clash) return `step "${step.id}": ${clash.message}`;
	}
	return null;
}

/**
 * Plans a route with the default rule table, every plan re-checked through `checkRouteDocument`,
 * and says for each plan which hazards its added steps bring and which cautions remain.
 */
export function planRouteDocument(document: RouteDocument): CheckedPlanAnswer {
	const answer = planRoute(document, { verify: firstClash, rules: defaultCheckRules() });
	return { ...answer, plans: answer.plans.map((plan) => ({ ...plan, ...safetyOf(plan) })) };
}

function safetyOf(plan: Plan): PlanSafety {
	// The re-check that admitted the plan filled the check's caches: this pass costs little.
	const checks = checkRouteDocument(plan.route);
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
		)
	};
}
