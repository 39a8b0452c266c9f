// The state of one open route map: the document, its saved version, autosave, undo, the clash
// check and structure depictions. Components read it through context and change it only through
// its methods, which replace the document (never mutate it) so undo and autosave see every edit.

import { SvelteMap } from 'svelte/reactivity';
import type { RouteDocument } from '$lib/route/document';
import type {
	Analysis,
	ConditionLabel,
	RouteClient,
	RuleLabels,
	StepCheck
} from '$lib/client/route-client';
import type { Toasts } from '$lib/client/toasts.svelte';
import * as ops from './document-ops';
import { heavyAtomCount, substrateHighlight } from './step-view';

export type SaveState = 'saved' | 'pending' | 'saving' | 'failed' | 'conflict';
export type Selection = { kind: 'intermediate' | 'step'; id: string } | null;
export type AnalysisState =
	| { status: 'loading' }
	| { status: 'ready'; analysis: Analysis }
	| { status: 'failed'; message: string };
export type CheckState = Map<string, StepCheck> | 'unavailable' | null;

const SAVE_DELAY_MS = 700;
const UNDO_LIMIT = 100;
/** Keystrokes in one field within this window undo together, not letter by letter. */
const COALESCE_MS = 1500;

type Init = {
	routeId: string;
	projectId: string;
	version: number;
	document: RouteDocument;
	canEdit: boolean;
	analyses: Record<string, Analysis>;
	/** Names for rule-table ids, sent with the page load (so no download of the rule table). */
	labels: RuleLabels & { conditions: ConditionLabel[] };
};

export class RouteEditor {
	readonly routeId: string;
	readonly projectId: string;
	readonly canEdit: boolean;
	#doc = $state.raw<RouteDocument>({ name: '', intermediates: [], steps: [] });
	#version = $state(1);
	#saveState = $state<SaveState>('saved');
	#failure = $state('');
	#check = $state.raw<CheckState>(null);
	#selection = $state.raw<Selection>(null);
	readonly ruleLabels: RuleLabels;
	readonly conditionLabels: ConditionLabel[];
	#undo = $state.raw<RouteDocument[]>([]);
	#analyses = new SvelteMap<string, AnalysisState>();
	#savedDoc: RouteDocument;
	#coalesce: { key: string; at: number } | null = null;
	#timer: ReturnType<typeof setTimeout> | undefined;
	#inFlight: Promise<unknown> | null = null;

	constructor(
		init: Init,
		private readonly client: RouteClient,
		private readonly toasts: Toasts
	) {
		this.routeId = init.routeId;
		this.projectId = init.projectId;
		this.canEdit = init.canEdit;
		this.conditionLabels = init.labels.conditions;
		this.ruleLabels = init.labels;
		this.#doc = init.document;
		this.#savedDoc = init.document;
		this.#version = init.version;
		for (const [structure, analysis] of Object.entries(init.analyses)) {
			this.#analyses.set(key(structure, ''), { status: 'ready', analysis });
		}
	}

	get doc() {
		return this.#doc;
	}
	get version() {
		return this.#version;
	}
	get saveState() {
		return this.#saveState;
	}
	get failure() {
		return this.#failure;
	}
	get check() {
		return this.#check;
	}
	get selection() {
		return this.#selection;
	}
	get canUndo() {
		return this.canEdit && this.#undo.length > 0;
	}
	get hasUnsaved() {
		return this.#saveState !== 'saved';
	}

	/** First data after the page mounts: the check and a layout for unplaced nodes. */
	async start() {
		void this.refreshCheck();
		if (this.#doc.intermediates.some((node) => !node.position)) {
			// A view-only change: it is saved with the next real edit, and viewers can lay out too.
			const laid = ops.movePositions(this.#doc, await ops.layoutPositions(this.#doc));
			if (this.#doc === this.#savedDoc) {
				this.#savedDoc = laid;
			}
			this.#doc = laid;
		}
	}

	select(selection: Selection) {
		this.#selection = selection;
	}

	// ── Edits ────────────────────────────────────────────────────────────────────────────────

	addIntermediate(structure: string, label?: string): string {
		const id = ops.newId();
		this.#change(ops.addIntermediate(this.#doc, { id, structure, ...(label ? { label } : {}) }));
		this.#selection = { kind: 'intermediate', id };
		return id;
	}

	updateIntermediate(id: string, patch: { label?: string; structure?: string }, field?: string) {
		this.#change(ops.updateIntermediate(this.#doc, id, patch), field && `${id}:${field}`);
	}

	updateStep(id: string, patch: Parameters<typeof ops.updateStep>[2], field?: string) {
		this.#change(ops.updateStep(this.#doc, id, patch), field && `${id}:${field}`);
	}

	rename(name: string) {
		if (name.trim()) {
			this.#change({ ...this.#doc, name }, 'route:name');
		}
	}

	connect(from: string, to: string) {
		const result = ops.connect(this.#doc, from, to);
		if (!result.ok) {
			return this.toasts.show(result.reason, 'problem');
		}
		this.#change(result.doc);
		this.#selection = { kind: 'step', id: result.stepId };
	}

	remove(
		nodeIds: string[],
		inputs: { stepId: string; from: string }[] = [],
		stepIds: string[] = []
	) {
		this.#change(ops.removeElements(this.#doc, nodeIds, inputs, stepIds));
		const selected = this.#selection;
		if (selected && (nodeIds.includes(selected.id) || !this.#exists(selected))) {
			this.#selection = null;
		}
	}

	move(moves: Map<string, { x: number; y: number }>) {
		this.#change(ops.movePositions(this.#doc, moves));
	}

	async layout() {
		this.#change(ops.movePositions(this.#doc, await ops.layoutPositions(this.#doc)));
	}

	undo() {
		const previous = this.#undo.at(-1);
		if (!previous || !this.canEdit) {
			return;
		}
		this.#undo = this.#undo.slice(0, -1);
		this.#coalesce = null;
		this.#doc = previous;
		if (this.#selection && !this.#exists(this.#selection)) {
			this.#selection = null;
		}
		this.#schedule();
	}

	#exists(selection: NonNullable<Selection>) {
		const list = selection.kind === 'step' ? this.#doc.steps : this.#doc.intermediates;
		return list.some((item) => item.id === selection.id);
	}

	#change(next: RouteDocument, coalesceKey?: string | false) {
		if (!this.canEdit || next === this.#doc) {
			return;
		}
		const now = Date.now();
		const joins =
			coalesceKey && this.#coalesce?.key === coalesceKey && now - this.#coalesce.at < COALESCE_MS;
		if (!joins) {
			this.#undo = [...this.#undo.slice(-(UNDO_LIMIT - 1)), this.#doc];
		}
		this.#coalesce = coalesceKey ? { key: coalesceKey, at: now } : null;
		this.#doc = next;
		this.#schedule();
	}

	// ── Autosave ─────────────────────────────────────────────────────────────────────────────

	#schedule() {
		// During a conflict nothing is sent: the chemist decides first, and keeps typing meanwhile.
		if (this.#saveState === 'conflict') {
			return;
		}
		this.#saveState = this.#doc === this.#savedDoc ? 'saved' : 'pending';
		clearTimeout(this.#timer);
		if (this.#saveState === 'pending') {
			this.#timer = setTimeout(() => void this.saveNow(), SAVE_DELAY_MS);
		}
	}

	/** Sends the document now (also used by "Retry" and before leaving the page). */
	async saveNow() {
		clearTimeout(this.#timer);
		// A save already on its way picks up newer edits when it returns.
		if (this.#inFlight || this.#saveState === 'conflict' || !this.canEdit) {
			return;
		}
		const sent = this.#doc;
		if (sent === this.#savedDoc) {
			return void (this.#saveState = 'saved');
		}
		this.#saveState = 'saving';
		const request = this.client.save(this.routeId, this.#version, sent);
		this.#inFlight = request;
		const result = await request;
		this.#inFlight = null;
		if (result.ok) {
			this.#version = result.data.version;
			this.#savedDoc = sent;
			this.#saveState = 'saved';
			void this.refreshCheck();
			this.#schedule();
		} else if (result.status === 409) {
			this.#saveState = 'conflict';
		} else {
			this.#saveState = 'failed';
			this.#failure = result.message;
		}
	}

	/**
	 * Saves what is on the page and waits until the server holds it, for actions that read the
	 * stored route (the planner). False when it could not be saved (a conflict or a failure).
	 */
	async flush(): Promise<boolean> {
		while (this.canEdit && this.#saveState !== 'saved') {
			if (this.#saveState === 'conflict') {
				return false;
			}
			if (this.#inFlight) {
				await this.#inFlight;
			} else {
				await this.saveNow();
				if (this.#saveState === 'failed') {
					return false;
				}
			}
		}
		return true;
	}

	/** After a conflict: drop local edits and show the stored route. */
	async loadTheirs() {
		const result = await this.client.load(this.routeId);
		if (!result.ok) {
			return;
		}
		this.#doc = result.data.document;
		this.#savedDoc = result.data.document;
		this.#version = result.data.version;
		this.#undo = [];
		this.#selection = null;
		this.#saveState = 'saved';
		await this.start();
	}

	/** After a conflict: store the local document as a new route; returns its id. */
	async keepMineAsCopy(): Promise<string | null> {
		const name = `${this.#doc.name.slice(0, 108)} (my copy)`;
		const id = await this.client.create(this.projectId, { ...this.#doc, name });
		if (id) {
			this.#savedDoc = this.#doc;
			this.#saveState = 'saved';
			this.toasts.show(`Your version is saved as “${name}”.`, 'success');
		}
		return id;
	}

	async refreshCheck() {
		const check = await this.client.check(this.routeId);
		if (check !== null) {
			this.#check = check;
		}
	}

	// ── Structures ───────────────────────────────────────────────────────────────────────────

	analysis(structure: string, highlight = ''): AnalysisState | undefined {
		return this.#analyses.get(key(structure, highlight));
	}

	/** Starts fetching a depiction unless one is cached or on its way; call from an effect. */
	ensureAnalysis(structure: string, highlight = '') {
		const k = key(structure, highlight);
		if (this.#analyses.has(k)) {
			return;
		}
		this.#analyses.set(k, { status: 'loading' });
		void this.client.analyze(structure, highlight).then((result) => {
			this.#analyses.set(
				k,
				result.ok
					? { status: 'ready', analysis: result.data }
					: { status: 'failed', message: result.message }
			);
		});
	}

	/** Reads a structure before it enters the route; the answer is cached for its node. */
	async validate(structure: string): Promise<{ ok: true } | { ok: false; message: string }> {
		const result = await this.client.analyze(structure);
		if (!result.ok) {
			return { ok: false, message: result.message };
		}
		this.#analyses.set(key(structure, ''), { status: 'ready', analysis: result.data });
		return { ok: true };
	}

	/** Atoms to shade on an intermediate: the clashes of the selected step that starts from it. */
	highlightFor(intermediateId: string): string {
		const selected = this.#selection;
		const check = this.#check;
		if (selected?.kind !== 'step' || !(check instanceof Map)) {
			return '';
		}
		const step = this.#doc.steps.find((s) => s.id === selected.id);
		if (!step) {
			return '';
		}
		return substrateHighlight(step, check.get(step.id)?.clashes ?? [], intermediateId, (id) => {
			const node = this.#doc.intermediates.find((n) => n.id === id);
			const state = node && this.analysis(node.structure);
			return state?.status === 'ready' ? heavyAtomCount(state.analysis.formula) : null;
		});
	}
}

const key = (structure: string, highlight: string) => `${highlight}\u0000${structure}`;
