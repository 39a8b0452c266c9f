// The canvas view of a route document: one node per intermediate, one edge per step input (a
// convergent step draws several edges; the first carries the step's label and marker).

import type { Edge, Node } from '@xyflow/svelte';
import type { RouteDocument, RouteStep } from '$lib/route/document';
import type { Selection } from './undoable-document.svelte';

export type IntermediateNodeData = { intermediateId: string };
export type IntermediateFlowNode = Node<IntermediateNodeData, 'intermediate'>;
export type StepEdgeData = { stepId: string; from: string; primary: boolean };
export type StepFlowEdge = Edge<StepEdgeData, 'step'>;

export const edgeId = (stepId: string, from: string) => `${stepId}::${from}`;

/** The spoken name of a step that puts a protecting group on or takes one off; null for others. */
export function intentLabel(step: RouteStep): string | null {
	if (step.intent !== 'protect' && step.intent !== 'deprotect') {
		return null;
	}
	const kind = step.intent === 'protect' ? 'Protection step' : 'Deprotection step';
	return step.reagents ? `${kind}: ${step.reagents}` : kind;
}

/** Nodes for the document, keeping what the canvas knows of the old ones (size, selection). */
export function toNodes(
	doc: RouteDocument,
	previous: IntermediateFlowNode[],
	draggable: boolean,
	selectedIntermediate: string | null = null
): IntermediateFlowNode[] {
	const before = new Map(previous.map((node) => [node.id, node]));
	return doc.intermediates.map((node, index) => {
		const old = before.get(node.id);
		const position = node.position ?? old?.position ?? { x: index * 320, y: 0 };
		// The editor owns the selection: the canvas shows it (and its Delete key acts on it), so a
		// node cannot look selected on the canvas while the side panel shows something else.
		const selected = node.id === selectedIntermediate;
		if (
			old &&
			old.position.x === position.x &&
			old.position.y === position.y &&
			old.draggable === draggable &&
			Boolean(old.selected) === selected
		) {
			return old;
		}
		return {
			...(old ?? {}),
			id: node.id,
			type: 'intermediate',
			position,
			draggable,
			selected,
			data: old?.data ?? { intermediateId: node.id }
		};
	});
}

export function toEdges(
	doc: RouteDocument,
	previous: StepFlowEdge[],
	selectedStep: string | null
): StepFlowEdge[] {
	const before = new Map(previous.map((edge) => [edge.id, edge]));
	return doc.steps.flatMap((step) =>
		step.from.map((from, index) => {
			const id = edgeId(step.id, from);
			const selected = step.id === selectedStep;
			const old = before.get(id);
			// Screen readers otherwise hear "Edge from <uuid> to <uuid>" for the planner's steps too.
			const ariaLabel = intentLabel(step) ?? undefined;
			if (
				old &&
				old.selected === selected &&
				old.target === step.to &&
				old.data?.primary === (index === 0) &&
				old.ariaLabel === ariaLabel
			) {
				return old;
			}
			return {
				id,
				type: 'step' as const,
				source: from,
				target: step.to,
				selected,
				...(ariaLabel ? { ariaLabel } : {}),
				data: { stepId: step.id, from, primary: index === 0 }
			};
		})
	);
}

/**
 * What the canvas's own selection (a click, Enter on a focused node, a box) means for the editor's
 * one selection: the current item while the canvas still selects it, else the first node, else
 * the step of the first edge, else nothing. The canvas then shows exactly that item selected.
 */
export function selectionFromCanvas(
	nodes: readonly { id: string }[],
	edges: readonly { data?: StepEdgeData }[],
	current: Selection
): Selection {
	const stepIds = edges.flatMap((edge) => (edge.data ? [edge.data.stepId] : []));
	if (current?.kind === 'intermediate' && nodes.some((node) => node.id === current.id)) {
		return current;
	}
	if (current?.kind === 'step' && stepIds.includes(current.id)) {
		return current;
	}
	const [firstNode] = nodes;
	if (firstNode) {
		return { kind: 'intermediate', id: firstNode.id };
	}
	const [firstStep] = stepIds;
	return firstStep ? { kind: 'step', id: firstStep } : null;
}
