import type { Analysis } from '../../chem/analyze';
import type { ReviewHistoryEntry } from '../../api/answers';
import { buildRequest, prefilledRows } from '../../client/quantities-rows';
import type { QuantitiesAnswer, QuantitiesRequest } from '../../quantities/contract';
import type { RouteDocument, RouteStep } from '../../route/document';
import { stepOrder } from '../../route/step-names';
import type { StepCheck } from '../../rules/check/types';
import { approvalOf, approvedVersionIn, type Approval } from '../../review/history';
import { sortThreads, type CommentThread } from '../../review/threads';
import { ApiFailure } from '../api';
import { runChemistry } from '../chem-pool/pool';
import type { Route } from '../db';
import { routeMapLabels } from '../route-map-labels';
import { routeRuleLayer } from './team-rules-layer';
import { listComments } from './comments';
import { reviewHistory } from './review';

// The printable review copy of a route (/routes/{id}/report): the stored route with what the map
// shows for each step (drawings, the check, quantities, comments) gathered in one load. Whatever
// could not be computed is said in words on the copy, never left out.

/** An intermediate as printed: its drawing, or why there is none (the structure text is printed either way). */
export type CopyMolecule = {
	id: string;
	label: string;
	structure: string;
	svg: string | null;
	formula: string | null;
	notDrawn: string | null;
};

export type CopyQuantities = { computed: QuantitiesAnswer } | { notComputed: string } | null;

export type CopyStep = {
	id: string;
	number: number;
	from: string[];
	to: string;
	reagents: string | null;
	notes: string | null;
	/** Condition classes with labels; `byHand` when set on the step rather than read from reagents. */
	conditions: { id: string; label: string; byHand: boolean }[];
	/** The check's answer for this step; null when the check could not run at all (see `checkNote`). */
	check: StepCheck | null;
	quantities: CopyQuantities;
	threads: CommentThread[];
};

export type ReviewCopy = {
	approval: Approval | null;
	molecules: Record<string, CopyMolecule>;
	steps: CopyStep[];
	/** Why no step was checked (the pool timed out or was busy); null when the check ran. */
	checkNote: string | null;
	/** Why no structure is drawn; null when the drawings came (single ones may still be missing). */
	drawingsNote: string | null;
	routeThreads: CommentThread[];
	threadsOnRemovedSteps: CommentThread[];
	history: ReviewHistoryEntry[];
	comments: number;
};

type Failed = { failed: string; code: string };

/** A chemistry call's answer, or the message and code of its refusal or time-out. */
async function attempt<T>(run: () => Promise<T>): Promise<T | Failed> {
	try {
		return await run();
	} catch (caught) {
		if (caught instanceof ApiFailure) {
			return { failed: caught.message, code: caught.code };
		}
		throw caught;
	}
}
const failed = (value: unknown): value is Failed =>
	typeof value === 'object' && value !== null && 'failed' in value;

function molecules(
	document: RouteDocument,
	drawings: Record<string, Analysis> | Failed
): Record<string, CopyMolecule> {
	return Object.fromEntries(
		document.intermediates.map((node, index) => {
			const analysis = failed(drawings) ? undefined : drawings[node.structure];
			const notDrawn = !node.structure.trim()
				? 'No structure has been drawn for this intermediate.'
				: failed(drawings)
					? 'Not drawn (see the note above).'
					: !analysis
						? 'Not drawn: the structure cannot be read.'
						: (analysis.drawingSkipped ?? (analysis.svg ? null : 'Not drawn.'));
			const molecule: CopyMolecule = {
				id: node.id,
				label: node.label?.trim() || `Intermediate ${index + 1}`,
				structure: node.structure,
				svg: notDrawn ? null : (analysis?.svg ?? null),
				formula: analysis?.formula ?? null,
				notDrawn
			};
			return [node.id, molecule];
		})
	);
}

/** Each step's quantities request, or why it cannot be computed; null for steps without quantities. */
function quantityRequests(document: RouteDocument, steps: RouteStep[]) {
	return steps.map((step) => {
		if (!step.quantities && !step.waterRemoval) {
			return null;
		}
		const rows = step.quantities ?? prefilledRows(step, document);
		return buildRequest(rows, document, step.waterRemoval);
	});
}

async function stepQuantities(
	document: RouteDocument,
	steps: RouteStep[]
): Promise<CopyQuantities[]> {
	const readiness = quantityRequests(document, steps);
	const requests: QuantitiesRequest[] = readiness.flatMap((r) => (r?.ready ? [r.request] : []));
	const answers = requests.length
		? await attempt(() => runChemistry('quantitiesOfSteps', { requests }))
		: [];
	let next = 0;
	return readiness.map((ready): CopyQuantities => {
		if (ready === null) {
			return null;
		}
		if (!ready.ready) {
			return { notComputed: ready.why };
		}
		if (failed(answers)) {
			return { notComputed: `Quantities not computed: ${answers.failed}` };
		}
		const answer = answers[next++]!;
		return 'refused' in answer ? { notComputed: answer.refused } : { computed: answer };
	});
}

// The pool's own time-out message ends "nothing was checked", which is about its own request: said
// of the drawings on a copy whose check did run, it would mislead.
const DRAWING_FAILURES: Record<string, string> = {
	chemistry_timeout: 'drawing the structures took longer than the chemistry time limit',
	chemistry_busy: 'the chemistry workers were busy'
};

function drawingsNote({ failed, code }: Failed): string {
	const why = DRAWING_FAILURES[code] ?? failed.replace(/\.$/, '');
	return `Drawings are not available: ${why}. Each structure is printed as text; reload the page to try again.`;
}

function conditionsOf(step: RouteStep, check: StepCheck | null) {
	const labels = new Map<string, string>(
		routeMapLabels().conditions.map(({ id, label }) => [id, label])
	);
	const byHand = step.conditions ?? [];
	const fromReagents = (check?.conditions ?? []).filter((id) => !byHand.includes(id));
	return [
		...byHand.map((id) => ({ id, label: labels.get(id) ?? id, byHand: true })),
		...fromReagents.map((id) => ({ id, label: labels.get(id) ?? id, byHand: false }))
	];
}

/** Everything the review copy prints for `route` (its stored document passed in). */
export async function reviewCopy(route: Route, document: RouteDocument): Promise<ReviewCopy> {
	const ordered = stepOrder(document);
	const [drawings, checks, quantities, comments, history] = await Promise.all([
		// The general chemistry budget, not the route page's shorter one: a copy made to be printed
		// waits for its drawings rather than print without them.
		attempt(() =>
			runChemistry('drawRoute', {
				structures: document.intermediates.map((node) => node.structure)
			})
		),
		// Under the team's rule overrides, as the route page shows it.
		attempt(async () =>
			runChemistry('checkRoute', { document, layer: await routeRuleLayer(route) })
		),
		stepQuantities(document, ordered),
		listComments(route.id),
		reviewHistory(route.id)
	]);
	const checkById = failed(checks) ? new Map() : new Map(checks.map((c) => [c.id, c]));
	const threads = sortThreads(
		comments,
		ordered.map((step) => step.id)
	);
	const steps = ordered.map((step, index): CopyStep => {
		const check: StepCheck | null = checkById.get(step.id) ?? null;
		return {
			id: step.id,
			number: index + 1,
			from: step.from,
			to: step.to,
			reagents: step.reagents?.trim() || null,
			notes: step.notes?.trim() || null,
			conditions: conditionsOf(step, check),
			check,
			quantities: quantities[index]!,
			threads: threads.byStep.get(step.id) ?? []
		};
	});
	return {
		approval: approvalOf(approvedVersionIn(history), history, route.version),
		molecules: molecules(document, drawings),
		steps,
		checkNote: failed(checks) ? `Not checked: ${checks.failed}` : null,
		drawingsNote: failed(drawings) ? drawingsNote(drawings) : null,
		routeThreads: threads.route,
		threadsOnRemovedSteps: threads.onRemovedSteps,
		history,
		comments: comments.length
	};
}
