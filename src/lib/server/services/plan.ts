import type { RouteDocument } from '../../route/document';
import { planRoute, type PlanAnswer } from '../../rules/plan';
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

/** Plans a route with the default rule table, every plan re-checked through `checkRouteDocument`. */
export function planRouteDocument(document: RouteDocument): PlanAnswer {
	return planRoute(document, { verify: firstClash, rules: defaultCheckRules() });
}
