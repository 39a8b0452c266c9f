// Steps named by their place in the route, for people: canvas step ids are random UUIDs, so
// "step 2 (H2, Pd/C, EtOH)" says more than the id. Used by the plans dialog and the planner's
// rationale alike.

import type { RouteDocument, RouteStep } from './document';

const MAX_REAGENT_CHARS = 40;

/** Steps in route order: each after the steps that make its starting intermediates. */
export function stepOrder(doc: RouteDocument): RouteStep[] {
	const madeBy = new Map(doc.steps.map((step) => [step.to, step]));
	const depth = new Map<string, number>();
	const depthOf = (id: string, trail: Set<string>): number => {
		const known = depth.get(id);
		if (known !== undefined) {
			return known;
		}
		const step = madeBy.get(id);
		// A start of the route, or (in a document that is not valid yet) a cycle: stop there.
		if (!step || trail.has(id)) {
			return 0;
		}
		trail.add(id);
		const d = 1 + Math.max(...step.from.map((from) => depthOf(from, trail)));
		depth.set(id, d);
		return d;
	};
	return doc.steps
		.map((step, index) => ({ step, index, depth: depthOf(step.to, new Set()) }))
		.sort((a, b) => a.depth - b.depth || a.index - b.index)
		.map(({ step }) => step);
}

/** E.g. `{ s1 → 'step 1 (MeMgBr, THF)' }`; long reagent text is cut with an ellipsis. */
export function stepNames(doc: RouteDocument): Map<string, string> {
	return new Map(
		stepOrder(doc).map((step, i) => {
			const reagents = step.reagents?.trim() ?? '';
			const short =
				reagents.length > MAX_REAGENT_CHARS
					? `${reagents.slice(0, MAX_REAGENT_CHARS - 1).trimEnd()}…`
					: reagents;
			return [step.id, short ? `step ${i + 1} (${short})` : `step ${i + 1}`];
		})
	);
}

// An id a chemist typed ("s2", "grignard") reads well; a UUID or a long id does not.
const READABLE_ID = /^(?![0-9a-f]{8}-[0-9a-f]{4}-)[A-Za-z0-9][\w.-]{0,23}$/i;

/**
 * How prose names a step: by its own id when that reads well, else by its place in the route,
 * with its reagents either way, e.g. `step "s2" (H2, Pd/C, EtOH)` or `step 2 (H2, Pd/C, EtOH)`.
 */
export function stepLabeller(doc: RouteDocument): (id: string) => string {
	const names = stepNames(doc);
	const reagents = new Map(doc.steps.map((step) => [step.id, step.reagents?.trim() ?? '']));
	return (id) => {
		if (!READABLE_ID.test(id)) {
			return names.get(id) ?? `step "${id}"`;
		}
		const text = reagents.get(id) ?? '';
		const short =
			text.length > MAX_REAGENT_CHARS ? `${text.slice(0, MAX_REAGENT_CHARS - 1).trimEnd()}…` : text;
		return short ? `step "${id}" (${short})` : `step "${id}"`;
	};
}
