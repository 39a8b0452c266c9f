// The route as the planner reads it: one line of intermediates joined by steps, and each step's
// condition classes with the reagents that brought them (as the clash check sees them).

import type { RouteDocument, RouteIntermediate, RouteStep } from '../../route/document';
import type { CheckRules } from '../check/types';

export type StepCondition = { id: string; reagents: string[]; explicit: boolean };
export type Chain = { nodes: RouteIntermediate[]; steps: RouteStep[]; conditions: StepCondition[][] };

/** The route as a line, e.g. a → b → c; a string says why it is not one (convergent, branched). */
export function linearChain(doc: RouteDocument, rules: CheckRules): Chain | string {
	const joining = doc.steps.find((s) => s.from.length > 1);
	if (joining) return `The planner follows linear routes for now; step "${joining.id}" joins ${joining.from.length} intermediates.`;
	const byFrom = new Map<string, RouteStep[]>();
	for (const step of doc.steps) byFrom.set(step.from[0]!, [...(byFrom.get(step.from[0]!) ?? []), step]);
	const branching = [...byFrom.values()].find((list) => list.length > 1);
	if (branching) return `The planner follows linear routes for now; intermediate "${branching[0]!.from[0]}" starts two steps.`;
	const targets = new Set(doc.steps.map((s) => s.to));
	const starts = doc.intermediates.filter((n) => !targets.has(n.id) && byFrom.has(n.id));
	if (doc.steps.length === 0 || starts.length !== 1) return 'The planner needs one line of steps from a single starting intermediate.';
	const nodes = new Map(doc.intermediates.map((n) => [n.id, n]));
	const chain: Chain = { nodes: [starts[0]!], steps: [], conditions: [] };
	for (let step = byFrom.get(starts[0]!.id)?.[0]; step; step = byFrom.get(step.to)?.[0]) {
		chain.steps.push(step);
		chain.nodes.push(nodes.get(step.to)!);
		chain.conditions.push(stepConditions(rules, step.reagents, step.conditions));
	}
	return chain;
}

/** A step's condition classes, e.g. `'H2, Pd/C'` → `[{ id: 'hydrogenation', reagents: ['H2', …] }]`. */
export function stepConditions(rules: CheckRules, reagents: string | undefined, explicit: string[] = []): StepCondition[] {
	const classified = reagents?.trim() ? rules.classify(reagents) : { conditions: [], matched: [] };
	const ids = [...new Set([...explicit.filter((id) => rules.conditionIds.includes(id)), ...classified.conditions])];
	return ids.map((id) => ({
		id,
		reagents: [...new Set(classified.matched.filter((m) => m.conditions.includes(id)).map((m) => m.reagent))],
		explicit: explicit.includes(id)
	}));
}
