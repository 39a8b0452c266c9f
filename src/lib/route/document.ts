import { z } from 'zod';
import { STRUCTURE_LIMITS } from '../chem/limits';
import { FIELD_LIMITS } from '../schemas/limits';
import { text } from '../schemas/text';
import { MAX_MATERIALS, materialInput, waterRemovalInput } from '../quantities/contract';

/**
 * The route document: the one exchange form of a route (import, export, API, planner).
 * Ids are strings chosen by the client and only need to be unique within their list.
 */
export const MAX_ROUTE_NODES = 500;
export const MAX_STRUCTURE_CHARS = STRUCTURE_LIMITS.maxTextBytes;

const clientId = text()
	.trim()
	.min(1, 'An id cannot be empty.')
	.max(64, 'Keep ids under 64 characters.');

export const STEP_INTENTS = ['transform', 'protect', 'deprotect'] as const;
export type StepIntent = (typeof STEP_INTENTS)[number];

export const intermediateSchema = z.object({
	id: clientId,
	label: text().trim().max(FIELD_LIMITS.intermediateLabel.max).optional(),
	structure: text().max(MAX_STRUCTURE_CHARS, 'A structure is limited to 1 MB of text.'),
	position: z.object({ x: z.number().finite(), y: z.number().finite() }).optional()
});

export const stepSchema = z.object({
	id: clientId,
	from: z.array(clientId).min(1, 'A step needs at least one starting intermediate.').max(8),
	to: clientId,
	reagents: text().max(FIELD_LIMITS.stepReagents.max).optional(),
	conditions: z.array(text().max(64)).max(30).optional(),
	notes: text().max(FIELD_LIMITS.stepNotes.max).optional(),
	intent: z.enum(STEP_INTENTS).optional(),
	/** What is weighed out for the step (src/lib/quantities/contract.ts). */
	quantities: z.array(materialInput).max(MAX_MATERIALS).optional(),
	/** Water removal with an azeotrope and a trap, for a condensation; with its trap log. */
	waterRemoval: waterRemovalInput.optional(),
	/** The id of the team's saved condition (issue 16 library) this step follows. */
	savedCondition: z.uuid().optional()
});

/** A route's name, as the route document, the new-route form and the API all take it. */
export const routeName = text()
	.trim()
	.min(FIELD_LIMITS.routeName.min, 'Give the route a name.')
	.max(FIELD_LIMITS.routeName.max, `Keep the name to ${FIELD_LIMITS.routeName.max} characters.`);

export const routeDocumentShape = z.object({
	name: routeName,
	intermediates: z.array(intermediateSchema).max(MAX_ROUTE_NODES),
	steps: z.array(stepSchema).max(MAX_ROUTE_NODES)
});

export type RouteDocument = z.output<typeof routeDocumentShape>;
export type RouteIntermediate = RouteDocument['intermediates'][number];
export type RouteStep = RouteDocument['steps'][number];
export type RouteProblem = { path: (string | number)[]; message: string };

/** Problems a shape check cannot see: duplicate ids, dangling references, cycles. */
export function graphProblems(doc: RouteDocument): RouteProblem[] {
	const problems: RouteProblem[] = [];
	const known = new Set<string>();
	doc.intermediates.forEach((node, i) => {
		if (known.has(node.id)) {
			problems.push({
				path: ['intermediates', i, 'id'],
				message: `Duplicate intermediate id "${node.id}".`
			});
		}
		known.add(node.id);
	});
	const stepIds = new Set<string>();
	doc.steps.forEach((step, i) => {
		if (stepIds.has(step.id)) {
			problems.push({ path: ['steps', i, 'id'], message: `Duplicate step id "${step.id}".` });
		}
		stepIds.add(step.id);
		step.from.forEach((from, j) => {
			if (!known.has(from)) {
				problems.push({
					path: ['steps', i, 'from', j],
					message: `Step "${step.id}" starts from unknown intermediate "${from}".`
				});
			}
		});
		if (!known.has(step.to)) {
			problems.push({
				path: ['steps', i, 'to'],
				message: `Step "${step.id}" leads to unknown intermediate "${step.to}".`
			});
		}
		if (step.from.includes(step.to)) {
			problems.push({
				path: ['steps', i, 'to'],
				message: `Step "${step.id}" leads back to its own starting intermediate "${step.to}".`
			});
		}
		if (new Set(step.from).size !== step.from.length) {
			problems.push({
				path: ['steps', i, 'from'],
				message: `Step "${step.id}" lists the same starting intermediate twice.`
			});
		}
	});
	if (problems.length === 0) {
		const cycle = findCycle(doc);
		if (cycle) {
			problems.push({ path: ['steps'], message: `The steps form a cycle: ${cycle.join(' → ')}.` });
		}
	}
	return problems;
}

/** A cycle through the intermediates, as ids in order, or null (depth-first search). */
function findCycle(doc: RouteDocument): string[] | null {
	const next = new Map<string, string[]>();
	for (const step of doc.steps) {
		for (const from of step.from) {
			next.set(from, [...(next.get(from) ?? []), step.to]);
		}
	}
	const state = new Map<string, 'open' | 'done'>();
	const trail: string[] = [];
	const visit = (id: string): string[] | null => {
		state.set(id, 'open');
		trail.push(id);
		for (const to of next.get(id) ?? []) {
			if (state.get(to) === 'open') {
				return [...trail.slice(trail.indexOf(to)), to];
			}
			if (!state.has(to)) {
				const found = visit(to);
				if (found) {
					return found;
				}
			}
		}
		trail.pop();
		state.set(id, 'done');
		return null;
	};
	for (const node of doc.intermediates) {
		if (!state.has(node.id)) {
			const found = visit(node.id);
			if (found) {
				return found;
			}
		}
	}
	return null;
}

export type RouteValidation =
	{ ok: true; document: RouteDocument } | { ok: false; problems: RouteProblem[] };

/** Validates shape and graph, e.g. a step whose `to` names no intermediate is a problem. */
export function validateRouteDocument(input: unknown): RouteValidation {
	const parsed = routeDocumentShape.safeParse(input);
	if (!parsed.success) {
		return {
			ok: false,
			problems: parsed.error.issues.map((issue) => ({
				path: issue.path as (string | number)[],
				message: issue.message
			}))
		};
	}
	const problems = graphProblems(parsed.data);
	return problems.length ? { ok: false, problems } : { ok: true, document: parsed.data };
}
