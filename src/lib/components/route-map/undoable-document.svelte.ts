// The route document being edited, with its undo history and the one selection of the map.
// Every edit replaces the document (never mutates it), so undo and autosave see each one; the
// canvas and the side panel both read `selection`, so they cannot disagree about what Delete hits.

import type { RouteDocument, RouteIntermediate, RouteStep } from '$lib/route/document';

export type Selection = { kind: 'intermediate' | 'step'; id: string } | null;

const UNDO_LIMIT = 100;
/** Built whole for each document and never changed, so a plain (read-only) Map is enough. */
const byId = <T extends { id: string }>(items: readonly T[]): ReadonlyMap<string, T> =>
	new Map(items.map((item) => [item.id, item]));
/** Keystrokes in one field within this window undo together, not letter by letter. */
const COALESCE_MS = 1500;

export class UndoableDocument {
	#doc = $state.raw<RouteDocument>({ name: '', intermediates: [], steps: [] });
	#undo = $state.raw<RouteDocument[]>([]);
	#selection = $state.raw<Selection>(null);
	#coalesce: { key: string; at: number } | null = null;

	// Looked up by every node, edge and panel on every edit: one map per document, not a scan each.
	readonly intermediates = $derived(byId(this.#doc.intermediates));
	readonly steps = $derived(byId(this.#doc.steps));

	constructor(
		document: RouteDocument,
		/** Called after every change of the document (an edit, an undo, a reload). */
		private readonly onchange: () => void
	) {
		this.#doc = document;
	}

	get current() {
		return this.#doc;
	}
	get selection() {
		return this.#selection;
	}
	get canUndo() {
		return this.#undo.length > 0;
	}

	intermediate(id: string): RouteIntermediate | undefined {
		return this.intermediates.get(id);
	}
	step(id: string): RouteStep | undefined {
		return this.steps.get(id);
	}

	/** Sets the selection; the same item again is no change (the canvas reports its selection back). */
	select(selection: Selection) {
		const now = this.#selection;
		if (
			now === selection ||
			(now && selection && now.kind === selection.kind && now.id === selection.id)
		) {
			return;
		}
		this.#selection = selection;
	}

	/** An undoable edit; edits with the same `coalesceKey` in quick succession undo as one. */
	change(next: RouteDocument, coalesceKey?: string | false) {
		if (next === this.#doc) {
			return;
		}
		const now = Date.now();
		const joins =
			coalesceKey && this.#coalesce?.key === coalesceKey && now - this.#coalesce.at < COALESCE_MS;
		if (!joins) {
			this.#undo = [...this.#undo.slice(-(UNDO_LIMIT - 1)), this.#doc];
		}
		this.#coalesce = coalesceKey ? { key: coalesceKey, at: now } : null;
		this.#set(next);
	}

	undo() {
		const previous = this.#undo.at(-1);
		if (!previous) {
			return;
		}
		this.#undo = this.#undo.slice(0, -1);
		this.#coalesce = null;
		this.#set(previous);
	}

	/** A change that is not an edit (a first layout, the stored route after a conflict). */
	replace(next: RouteDocument, { forgetHistory = false } = {}) {
		if (forgetHistory) {
			this.#undo = [];
			this.#coalesce = null;
			this.#selection = null;
		}
		this.#set(next);
	}

	#set(next: RouteDocument) {
		this.#doc = next;
		const selected = this.#selection;
		const list = selected?.kind === 'step' ? next.steps : next.intermediates;
		if (selected && !list.some((item) => item.id === selected.id)) {
			this.#selection = null;
		}
		this.onchange();
	}
}
