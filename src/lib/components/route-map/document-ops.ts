// Pure edits of a route document. The editor state calls these and replaces its document with the
// result, so undo is a stack of earlier documents and every edit is testable without a browser.

import type { RouteDocument, RouteIntermediate, RouteStep } from '$lib/route/document';

export const NODE_WIDTH = 240;
export const NODE_HEIGHT = 230;

export function newId(): string {
	return crypto.randomUUID();
}

/** Where a new intermediate goes: right of the rightmost one, so it never lands on top of another. */
export function nextPosition(doc: RouteDocument): { x: number; y: number } {
	const placed = doc.intermediates.flatMap((node) => (node.position ? [node.position] : []));
	if (placed.length === 0) {
		return { x: 0, y: 0 };
	}
	const right = placed.reduce((a, b) => (b.x > a.x ? b : a));
	return { x: right.x + NODE_WIDTH + 80, y: right.y };
}

export function addIntermediate(
	doc: RouteDocument,
	node: Omit<RouteIntermediate, 'position'>
): RouteDocument {
	return {
		...doc,
		intermediates: [...doc.intermediates, { ...node, position: nextPosition(doc) }]
	};
}

export function updateIntermediate(
	doc: RouteDocument,
	id: string,
	patch: Partial<Omit<RouteIntermediate, 'id'>>
): RouteDocument {
	return {
		...doc,
		intermediates: doc.intermediates.map((node) =>
			node.id === id ? withoutEmpty({ ...node, ...patch }) : node
		)
	};
}

export function updateStep(
	doc: RouteDocument,
	id: string,
	patch: Partial<Omit<RouteStep, 'id' | 'from' | 'to'>>
): RouteDocument {
	return {
		...doc,
		steps: doc.steps.map((step) => (step.id === id ? withoutEmpty({ ...step, ...patch }) : step))
	};
}

/** Optional fields are left out rather than stored empty, so documents compare and export cleanly. */
function withoutEmpty<T extends Record<string, unknown>>(value: T): T {
	const copy: Record<string, unknown> = { ...value };
	for (const [key, field] of Object.entries(copy)) {
		if (field === undefined || field === '' || (Array.isArray(field) && field.length === 0)) {
			delete copy[key];
		}
	}
	return copy as T;
}

export function movePositions(
	doc: RouteDocument,
	moves: Map<string, { x: number; y: number }>
): RouteDocument {
	if (
		![...moves].some(([id, p]) => {
			const node = doc.intermediates.find((n) => n.id === id);
			return node && (node.position?.x !== p.x || node.position?.y !== p.y);
		})
	) {
		return doc;
	}
	return {
		...doc,
		intermediates: doc.intermediates.map((node) => {
			const moved = moves.get(node.id);
			return moved
				? { ...node, position: { x: Math.round(moved.x), y: Math.round(moved.y) } }
				: node;
		})
	};
}

/** Whether `to` can already reach `from`, so a step from → to would close a cycle. */
export function wouldCycle(doc: RouteDocument, from: string, to: string): boolean {
	if (from === to) {
		return true;
	}
	const seen = new Set<string>();
	const stack = [to];
	while (stack.length) {
		const at = stack.pop()!;
		if (at === from) {
			return true;
		}
		if (seen.has(at)) {
			continue;
		}
		seen.add(at);
		for (const step of doc.steps) {
			if (step.from.includes(at)) {
				stack.push(step.to);
			}
		}
	}
	return false;
}

export type ConnectResult =
	{ ok: true; doc: RouteDocument; stepId: string } | { ok: false; reason: string };

/**
 * Joins two intermediates. A target that already has an incoming step gains another input (a
 * convergent step) instead of a second step, so one product always comes from one step.
 */
export function connect(doc: RouteDocument, from: string, to: string): ConnectResult {
	if (wouldCycle(doc, from, to)) {
		return { ok: false, reason: 'That step would lead back to where the route started.' };
	}
	const existing = doc.steps.find((step) => step.to === to);
	if (existing) {
		if (existing.from.includes(from)) {
			return { ok: false, reason: 'Those intermediates are already joined by a step.' };
		}
		if (existing.from.length >= 8) {
			return { ok: false, reason: 'A step takes at most 8 starting intermediates.' };
		}
		return {
			ok: true,
			stepId: existing.id,
			doc: {
				...doc,
				steps: doc.steps.map((s) => (s === existing ? { ...s, from: [...s.from, from] } : s))
			}
		};
	}
	const step: RouteStep = { id: newId(), from: [from], to };
	return { ok: true, stepId: step.id, doc: { ...doc, steps: [...doc.steps, step] } };
}

/** Removes intermediates (with the steps that need them) and single step inputs (`{ stepId, from }`). */
export function removeElements(
	doc: RouteDocument,
	nodeIds: string[],
	inputs: { stepId: string; from: string }[],
	stepIds: string[] = []
): RouteDocument {
	const gone = new Set(nodeIds);
	const steps = doc.steps.flatMap((step) => {
		if (stepIds.includes(step.id) || gone.has(step.to)) {
			return [];
		}
		const from = step.from.filter(
			(id) => !gone.has(id) && !inputs.some((i) => i.stepId === step.id && i.from === id)
		);
		return from.length ? [from.length === step.from.length ? step : { ...step, from }] : [];
	});
	return { ...doc, intermediates: doc.intermediates.filter((node) => !gone.has(node.id)), steps };
}

/** Positions from a dagre left-to-right layout, e.g. for an imported route that has none. */
export async function layoutPositions(
	doc: RouteDocument
): Promise<Map<string, { x: number; y: number }>> {
	// Loaded on first use: most visits never lay out, and the budget counts the first load.
	const { Graph, layout } = await import('@dagrejs/dagre');
	const graph = new Graph();
	graph.setGraph({ rankdir: 'LR', nodesep: 60, ranksep: 220 });
	graph.setDefaultEdgeLabel(() => ({}));
	for (const node of doc.intermediates) {
		graph.setNode(node.id, { width: NODE_WIDTH, height: NODE_HEIGHT });
	}
	for (const step of doc.steps) {
		for (const from of step.from) {
			graph.setEdge(from, step.to);
		}
	}
	layout(graph);
	const positions = new Map<string, { x: number; y: number }>();
	for (const node of doc.intermediates) {
		const placed = graph.node(node.id);
		// dagre gives centres; the canvas places nodes by their top-left corner.
		positions.set(node.id, { x: placed.x - NODE_WIDTH / 2, y: placed.y - NODE_HEIGHT / 2 });
	}
	return positions;
}
