// How a plan reads in the plans dialog: steps named by their place in the route (ids may be
// random UUIDs from the canvas), where each protecting group goes on and comes off, in words.

import type { RuleLabels } from '$lib/client/route-client';
import type { Plan, Protection } from '$lib/rules/plan';

export { stepNames, stepOrder } from '$lib/route/step-names';

const stepName = (names: Map<string, string>, id: string) => names.get(id) ?? `step “${id}”`;

/** Where the protecting group goes on, e.g. 'before step 1 (MeMgBr, THF)'. */
export function installPlace(protection: Protection, names: Map<string, string>): string {
	return `before ${stepName(names, protection.install.before)}`;
}

/** Where it comes off: 'after step 2 (…)' or 'at the end'. */
export function removalPlace(protection: Protection, names: Map<string, string>): string {
	const after = protection.removal.after;
	return after === 'end' ? 'at the end' : `after ${stepName(names, after)}`;
}

/** A free group's label from the rule table, or its id until the labels arrive. */
export function groupName(id: string, labels: RuleLabels | null): string {
	if (id === 'route') {
		return 'the route';
	}
	return labels?.groups.get(id) ?? id;
}

/** The protecting group's own label, e.g. 'TBS' → 'tert-butyldimethylsilyl ether'; null if unknown. */
export function protectingGroupName(id: string, labels: RuleLabels | null): string | null {
	const label = labels?.protectingGroups.get(id);
	return label && label !== id ? label : null;
}

/** The structure of the first intermediate that carries the protection, for its drawing. */
export function protectedStructure(plan: Plan, protection: Protection): string | null {
	return plan.route.intermediates.find((n) => n.id === protection.intermediate)?.structure ?? null;
}

export function addedStepsText(count: number): string {
	return count === 0 ? 'No added steps' : count === 1 ? '1 added step' : `${count} added steps`;
}
