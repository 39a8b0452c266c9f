// The step's quantities table between the route document and `POST /api/quantities`: the rows a
// step starts with, the request built from them, and the API's refusals placed on their rows.

import type { RouteDocument, RouteStep } from '$lib/route/document';
import type { MaterialInput, QuantitiesRequest, WaterRemovalInput } from '$lib/quantities/contract';

/**
 * The rows a step's table starts with: its substrates (the first limiting) and its product, each
 * pointing at its own intermediate, e.g. a step A → B gives `[{ name: 'aldehyde', role:
 * 'limiting', structure: 'A' }, { name: 'dioxolane', role: 'product', structure: 'B' }]`.
 */
export function prefilledRows(step: RouteStep, doc: RouteDocument): MaterialInput[] {
	const labelOf = (id: string, fallback: string) =>
		doc.intermediates.find((n) => n.id === id)?.label?.trim() || fallback;
	return [
		...step.from.map((id, index): MaterialInput => ({
			name: labelOf(id, step.from.length > 1 ? `substrate ${index + 1}` : 'substrate'),
			role: index === 0 ? 'limiting' : 'reagent',
			structure: id
		})),
		{ name: labelOf(step.to, 'product'), role: 'product', structure: step.to }
	];
}

/** The intermediate a row's structure names, when it is one of the route's ids. */
export function intermediateOf(structure: string | undefined, doc: RouteDocument) {
	return structure ? doc.intermediates.find((n) => n.id === structure) : undefined;
}

export type Readiness = { ready: true; request: QuantitiesRequest } | { ready: false; why: string };

/**
 * The request for the rows, with intermediate ids replaced by their structures (the API stores
 * nothing and knows no route). Not ready until the limiting material has an amount: before that
 * every row would come back refused.
 */
export function buildRequest(
	rows: MaterialInput[],
	doc: RouteDocument,
	waterRemoval?: WaterRemovalInput
): Readiness {
	const limiting = rows.filter((row) => row.role === 'limiting');
	const [first] = limiting;
	if (!first || limiting.length > 1) {
		return {
			ready: false,
			why: limiting.length
				? 'Mark only one material as limiting.'
				: 'Mark one material as limiting to compute the amounts.'
		};
	}
	if (![first.mass, first.volume, first.amount].some((value) => value !== undefined)) {
		return { ready: false, why: `Enter how much ${first.name} you use (e.g. 20 g).` };
	}
	const materials = rows.map((row) => {
		const { structure, ...rest } = row;
		// An intermediate's id becomes its structure; a structure field left empty is no structure.
		const resolved = intermediateOf(structure, doc)?.structure ?? structure;
		return resolved?.trim() ? { ...rest, structure: resolved } : rest;
	});
	return { ready: true, request: { materials, ...(waterRemoval ? { waterRemoval } : {}) } };
}

export type PlacedErrors = { rows: Map<number, string[]>; water: string[]; general: string[] };

type Issue = { path?: unknown; message?: unknown };

/**
 * A refusal of `POST /api/quantities` placed where the chemist can act on it: on the row its
 * details point to (`materials.2.volume`) or name (`{ material }`), on the row whose name the message quotes, on the
 * water-removal card, or above the table when it names nothing.
 */
export function placeErrors(
	failure: { message: string; details?: unknown },
	rows: MaterialInput[]
): PlacedErrors {
	const placed: PlacedErrors = { rows: new Map(), water: [], general: [] };
	const onRow = (index: number, message: string) =>
		placed.rows.set(index, [...(placed.rows.get(index) ?? []), message]);
	const issues = issuesOf(failure.details);
	for (const issue of issues) {
		const path = pathOf(issue.path);
		const message = typeof issue.message === 'string' ? issue.message : failure.message;
		if (path[0] === 'materials' && typeof path[1] === 'number' && path[1] < rows.length) {
			onRow(path[1], message);
		} else if (path[0] === 'waterRemoval') {
			placed.water.push(message);
		} else {
			placed.general.push(message);
		}
	}
	if (issues.length === 0) {
		// The engine's refusals (422) name their material in `details.material`.
		const material = (failure.details as { material?: unknown } | undefined)?.material;
		const byDetails = rows.findIndex((row) => row.name === material);
		const named =
			byDetails >= 0
				? byDetails
				: rows.findIndex((row) => failure.message.includes(`“${row.name}”`));
		const nameHit =
			named >= 0 ? named : rows.findIndex((row) => failure.message.includes(row.name));
		if (nameHit >= 0) {
			onRow(nameHit, failure.message);
		} else if (/solvent|trap|log|reading|water/i.test(failure.message)) {
			placed.water.push(failure.message);
		} else {
			placed.general.push(failure.message);
		}
	}
	return placed;
}

function issuesOf(details: unknown): Issue[] {
	const list = Array.isArray(details)
		? details
		: details &&
			  typeof details === 'object' &&
			  Array.isArray((details as { issues?: unknown }).issues)
			? (details as { issues: unknown[] }).issues
			: details && typeof details === 'object' && 'path' in details
				? [details]
				: [];
	return list.filter((item): item is Issue => !!item && typeof item === 'object');
}

function pathOf(path: unknown): (string | number)[] {
	if (Array.isArray(path)) {
		return path.filter((p) => typeof p === 'string' || typeof p === 'number');
	}
	if (typeof path === 'string') {
		return path.split('.').map((part) => (/^\d+$/.test(part) ? Number(part) : part));
	}
	return [];
}
