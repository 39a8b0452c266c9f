// The route as the planner reads it: a tree of intermediates that converges on one target
// (a linear route is the simplest such tree), with each step's condition classes and the
// reagents that brought them, as the clash check sees them.

import type { RouteDocument, RouteIntermediate, RouteStep } from '../../route/document';
import { stepLabeller } from '../../route/step-names';
import { conditionOrigins } from '../check/condition-origins';
import type { CheckRules } from '../check/types';

/**
 * One class a step brings and the reagents that bring it. `explicit` marks a class set by hand that
 * no reagent brings: its `reagents` are then empty, so the class rating applies as it is.
 */
export type StepCondition = { id: string; reagents: string[]; explicit: boolean };

export type RouteTree = {
	/** Intermediates on some step, substrates before products (a topological order). */
	nodes: RouteIntermediate[];
	/** Steps in the same order: every substrate is made before the step that uses it. */
	steps: RouteStep[];
	byId: Map<string, RouteIntermediate>;
	/** The step that uses an intermediate (none for the target). */
	next: Map<string, RouteStep>;
	/** The step that makes an intermediate (none for a starting material). */
	made: Map<string, RouteStep>;
	conditions: Map<string, StepCondition[]>;
	/** The one intermediate no step uses: where every branch ends. */
	target: string;
	/** How the rationale names a step, e.g. `step "s2" (H2, Pd/C, EtOH)`. */
	stepName: (id: string) => string;
};

/**
 * The route as a tree converging on one target, e.g. a → c ← b with a coupling step from a and b;
 * a string says why it is not one (an intermediate used by two steps, or two targets).
 */
export function routeTree(doc: RouteDocument, rules: CheckRules): RouteTree | string {
	if (doc.steps.length === 0) {
		return 'The route has no steps to plan.';
	}
	const next = new Map<string, RouteStep>();
	const made = new Map<string, RouteStep>();
	for (const step of doc.steps) {
		for (const from of step.from) {
			const other = next.get(from);
			if (other) {
				return `Intermediate "${from}" is used by two steps ("${other.id}" and "${step.id}"); the planner plans routes that converge on one target, so plan each branch as its own route.`;
			}
			next.set(from, step);
		}
		const other = made.get(step.to);
		if (other) {
			return `Intermediate "${step.to}" is made by two steps ("${other.id}" and "${step.id}"); keep one of them for planning.`;
		}
		made.set(step.to, step);
	}
	const byId = new Map(doc.intermediates.map((n) => [n.id, n]));
	const onSteps = doc.intermediates.filter((n) => next.has(n.id) || made.has(n.id));
	const targets = onSteps.filter((n) => !next.has(n.id));
	if (targets.length !== 1) {
		return `The route ends in ${targets.length} intermediates (${targets.map((n) => `"${n.id}"`).join(', ')}); the planner needs the steps to converge on one target.`;
	}
	// Depth-first from the target: each step after everything that feeds it.
	const nodes: RouteIntermediate[] = [];
	const steps: RouteStep[] = [];
	const visit = (id: string) => {
		const step = made.get(id);
		if (step) {
			for (const from of step.from) {
				visit(from);
			}
			steps.push(step);
		}
		nodes.push(byId.get(id)!);
	};
	visit(targets[0]!.id);
	if (steps.length !== doc.steps.length) {
		return "Some steps do not lead to the route's target (a loop?); the planner needs every step on the way to one target.";
	}
	const conditions = new Map(
		steps.map((s) => [s.id, stepConditions(rules, s.reagents, s.conditions)])
	);
	return {
		nodes,
		steps,
		byId,
		next,
		made,
		conditions,
		target: targets[0]!.id,
		stepName: stepLabeller(doc)
	};
}

/** A step's condition classes, e.g. `'H2, Pd/C'` → `[{ id: 'hydrogenation', reagents: ['H2', …] }]`. */
export function stepConditions(
	rules: CheckRules,
	reagents: string | undefined,
	explicit: string[] = []
): StepCondition[] {
	const known = explicit.filter((id) => rules.conditionIds.includes(id));
	const classified = reagents?.trim() ? rules.classify(reagents) : { conditions: [], matched: [] };
	return conditionOrigins(known, classified).map((o) => ({
		id: o.id,
		reagents: o.reagents.map((b) => b.reagent),
		explicit: o.explicit
	}));
}
