// The state of one open route map, behind one object in context: the undoable document and its
// selection (undoable-document), autosave (autosave), structure depictions (structure-drawings)
// and the clash check (clash-check). Components read it and change the route only through its
// methods, which replace the document (never mutate it) so undo and autosave see every edit.

import type { Analysis, ConditionLabel, RouteClient, RuleLabels } from '$lib/client/route-client';
import type { Toasts } from '$lib/client/toasts.svelte';
import type { ApiResult } from '$lib/client/api';
import type { CreatedSavedConditionAnswer, SavedConditionAnswer } from '$lib/api/answers';
import type { NewSavedConditionRequest } from '$lib/library/contract';
import type { RouteDocument } from '$lib/route/document';
import { FIELD_LIMITS, withSuffix } from '$lib/schemas/limits';
import { Autosave } from './autosave.svelte';
import { ClashCheck } from './clash-check.svelte';
import * as ops from './document-ops';
import { heavyAtomCount, substrateHighlight } from './step-view';
import { StructureDrawings } from './structure-drawings.svelte';
import { TeamLibrary } from './team-library.svelte';
import { UndoableDocument, type Selection } from './undoable-document.svelte';

export type { SaveState } from './autosave.svelte';
export type { Selection } from './undoable-document.svelte';

type Init = {
	routeId: string;
	projectId: string;
	version: number;
	document: RouteDocument;
	canEdit: boolean;
	analyses: Record<string, Analysis>;
	/** Names for rule-table ids, sent with the page load (so no download of the rule table). */
	labels: RuleLabels & { conditions: ConditionLabel[] };
	/**
	 * The route's team and its condition library as the page load read it (the step panel's
	 * suggestions, and where a step's conditions are saved).
	 */
	library?: { teamId: string; entries: SavedConditionAnswer[] };
	/** Whether the caller may add to the team's library (`library.add`). */
	canSaveConditions?: boolean;
};

/** What the step panel asks for when it saves a step's conditions (the reagents are the step's). */
export type StepConditionFields = Omit<NewSavedConditionRequest, 'teamId' | 'reagents'>;

export class RouteEditor {
	readonly routeId: string;
	readonly projectId: string;
	readonly canEdit: boolean;
	readonly document: UndoableDocument;
	readonly autosave: Autosave;
	readonly structures: StructureDrawings;
	readonly check: ClashCheck;
	readonly ruleLabels: RuleLabels;
	readonly conditionLabels: ConditionLabel[];
	/** Null when the page came without the library (it could not be read, or a test left it out). */
	readonly teamLibrary: TeamLibrary | null;
	readonly canSaveConditions: boolean;

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
		this.teamLibrary = init.library
			? new TeamLibrary(init.library.teamId, init.library.entries, client)
			: null;
		this.canSaveConditions = (init.canSaveConditions ?? false) && this.teamLibrary !== null;
		this.document = new UndoableDocument(init.document, () => this.autosave.schedule());
		this.check = new ClashCheck(init.routeId, client);
		this.autosave = new Autosave(
			{
				routeId: init.routeId,
				version: init.version,
				saved: init.document,
				current: () => this.document.current,
				onsaved: () => void this.check.refresh()
			},
			client
		);
		this.structures = new StructureDrawings(client, init.analyses);
	}

	get doc() {
		return this.document.current;
	}
	get library(): SavedConditionAnswer[] | null {
		return this.teamLibrary?.entries ?? null;
	}
	get selection() {
		return this.document.selection;
	}
	get version() {
		return this.autosave.version;
	}
	get saveState() {
		return this.autosave.state;
	}
	get failure() {
		return this.autosave.failure;
	}
	get canUndo() {
		return this.canEdit && this.document.canUndo;
	}
	get hasUnsaved() {
		return this.saveState !== 'saved';
	}

	/** First data after the page mounts: the check and a layout for unplaced nodes. */
	async start() {
		void this.check.refresh();
		const before = this.doc;
		if (before.intermediates.some((node) => !node.position)) {
			// A view-only change: it is saved with the next real edit, and viewers can lay out too.
			const laid = ops.movePositions(before, await ops.layoutPositions(before));
			this.autosave.adoptIfSaved(before, laid);
			this.document.replace(laid);
		}
	}

	select(selection: Selection) {
		this.document.select(selection);
	}

	// ── Edits (nothing changes for viewers) ──────────────────────────────────────────────────

	addIntermediate(structure: string, label?: string): string {
		const id = ops.newId();
		this.#change(ops.addIntermediate(this.doc, { id, structure, ...(label ? { label } : {}) }));
		this.select({ kind: 'intermediate', id });
		return id;
	}

	updateIntermediate(id: string, patch: { label?: string; structure?: string }, field?: string) {
		this.#change(ops.updateIntermediate(this.doc, id, patch), field && `${id}:${field}`);
	}

	updateStep(id: string, patch: Parameters<typeof ops.updateStep>[2], field?: string) {
		this.#change(ops.updateStep(this.doc, id, patch), field && `${id}:${field}`);
	}

	rename(name: string) {
		if (name.trim()) {
			this.#change({ ...this.doc, name }, 'route:name');
		}
	}

	connect(from: string, to: string) {
		const result = ops.connect(this.doc, from, to);
		if (!result.ok) {
			return this.toasts.show(result.reason, 'problem');
		}
		this.#change(result.doc);
		this.select({ kind: 'step', id: result.stepId });
	}

	remove(
		nodeIds: string[],
		inputs: { stepId: string; from: string }[] = [],
		stepIds: string[] = []
	) {
		this.#change(ops.removeElements(this.doc, nodeIds, inputs, stepIds));
	}

	move(moves: Map<string, { x: number; y: number }>) {
		this.#change(ops.movePositions(this.doc, moves));
	}

	async layout() {
		this.#change(ops.movePositions(this.doc, await ops.layoutPositions(this.doc)));
	}

	undo() {
		if (this.canEdit) {
			this.document.undo();
		}
	}

	#change(next: RouteDocument, coalesceKey?: string | false) {
		if (this.canEdit) {
			this.document.change(next, coalesceKey);
		}
	}

	/**
	 * Saves the step's reagents as a new entry of the team's library and links the step to it
	 * (one undoable edit, saved before the library is read again, so the entry's uses count it).
	 * A refusal is returned for the panel to show; nothing changes then.
	 */
	async saveStepToLibrary(
		stepId: string,
		fields: StepConditionFields
	): Promise<ApiResult<CreatedSavedConditionAnswer> | null> {
		const reagents = this.doc.steps.find((step) => step.id === stepId)?.reagents?.trim();
		if (!this.canSaveConditions || !this.teamLibrary || !reagents) {
			return null;
		}
		const result = await this.teamLibrary.create({ ...fields, reagents });
		if (result.ok) {
			this.updateStep(stepId, { savedCondition: result.data.id });
			await this.flush();
			await this.teamLibrary.reload();
		}
		return result;
	}

	// ── Saving ───────────────────────────────────────────────────────────────────────────────

	/** Sends the document now (also used by "Retry" and before leaving the page). */
	async saveNow() {
		if (this.canEdit) {
			await this.autosave.saveNow();
		}
	}

	/**
	 * Saves what is on the page and waits until the server holds it, for actions that read the
	 * stored route (the planner). False when it could not be saved (a conflict or a failure).
	 */
	flush(): Promise<boolean> {
		return this.canEdit ? this.autosave.flush() : Promise.resolve(true);
	}

	/** After a conflict: drop local edits and show the stored route. */
	async loadTheirs() {
		const result = await this.client.load(this.routeId);
		if (!result.ok) {
			return;
		}
		this.autosave.markSaved(result.data.document, result.data.version);
		this.document.replace(result.data.document, { forgetHistory: true });
		await this.start();
	}

	/** After a conflict: store the local document as a new route; returns its id. */
	async keepMineAsCopy(): Promise<string | null> {
		const mine = this.doc;
		const name = withSuffix(mine.name, ' (my copy)', FIELD_LIMITS.routeName.max);
		const id = await this.client.create(this.projectId, { ...mine, name });
		if (id) {
			this.autosave.markSaved(mine);
			this.toasts.show(`Your version is saved as “${name}”.`, 'success');
		}
		return id;
	}

	/** Atoms to shade on an intermediate: the clashes of the selected step that starts from it. */
	highlightFor(intermediateId: string): string {
		const selected = this.selection;
		const step = selected?.kind === 'step' ? this.document.step(selected.id) : undefined;
		const check = step && this.check.of(step.id);
		if (!step || !check) {
			return '';
		}
		return substrateHighlight(step, check.clashes, intermediateId, (id) => {
			const node = this.document.intermediate(id);
			const state = node && this.structures.analysis(node.structure);
			return state?.status === 'ready' ? heavyAtomCount(state.analysis.formula) : null;
		});
	}
}
