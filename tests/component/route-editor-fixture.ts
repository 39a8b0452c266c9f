// A RouteEditor with a browser client that never reaches a server: the check answer and the
// analyses are what each test gives. Component tests render under it with WithRouteEditor.

import { render } from '@testing-library/svelte';
import type { Component } from 'svelte';
import { vi } from 'vitest';
import { RouteEditor } from '$lib/components/route-map/route-editor.svelte';
import type { Analysis, ConditionLabel, RouteClient, StepCheck } from '$lib/client/route-client';
import type { SavedConditionAnswer } from '$lib/api/answers';
import type { ApiResult } from '$lib/client/api';
import { Toasts } from '$lib/client/toasts.svelte';
import type { RouteDocument } from '$lib/route/document';
import type { ReviewState } from '$lib/components/review/review-state.svelte';
import { fakeReviewApi, makeReview } from './review-fixture';
import type { NewSavedConditionRequest } from '$lib/library/contract';
import { libraryEntry, LIBRARY_TEAM } from '../factories/library-entries';
import WithRouteEditor from './WithRouteEditor.svelte';

export const routeDoc: RouteDocument = {
	name: 'OG-2031',
	intermediates: [
		{ id: 'a', label: 'keto ester', structure: 'CC(=O)CCC(=O)OC', position: { x: 0, y: 0 } },
		{ id: 'b', label: 'hydroxy ketone', structure: 'CC(=O)CCC(C)(C)O', position: { x: 320, y: 0 } }
	],
	steps: [{ id: 's1', from: ['a'], to: 'b', reagents: 'MeMgBr, THF' }]
};

/** One step's check answer with nothing found, changed by `over`. */
export const stepCheck = (over: Partial<StepCheck> = {}): StepCheck => ({
	id: 's1',
	conditions: [],
	hazards: [],
	clashes: [],
	unrecognized: [],
	...over
});

type Options = {
	canEdit?: boolean;
	document?: RouteDocument;
	checks?: StepCheck[];
	labels?: ConditionLabel[] | null;
	/** Analyses by structure, as the page load sends them. */
	analyses?: Record<string, Analysis>;
	library?: SavedConditionAnswer[];
	canSaveConditions?: boolean;
};

/** The editor, with its check answer already in (when `checks` is given). */
export async function makeEditor({
	canEdit = true,
	document = routeDoc,
	checks,
	labels = null,
	analyses = {},
	library,
	canSaveConditions = canEdit
}: Options = {}) {
	// The team's library as a fake server holds it: a saved condition is added to what it lists.
	const stored = [...(library ?? [])];
	const client = {
		library: vi.fn(async () => [...stored]),
		saveCondition: vi.fn(async (body: NewSavedConditionRequest) => {
			const { teamId, ...fields } = body;
			const entry = libraryEntry({ ...fields, teamId, approved: false, uses: 0 });
			stored.push(entry);
			return { ok: true, status: 201, data: { id: entry.id } };
		}),
		save: vi.fn(async () => ({ ok: true, status: 200, data: { version: 2 } })),
		// No `checks`: an answer with no steps in it (no verdict shown, and no failure either).
		check: vi.fn(async () => ({
			ok: true,
			status: 200,
			data: new Map((checks ?? []).map((c) => [c.id, c]))
		})),
		analyze: vi.fn(async (structure: string): Promise<ApiResult<Analysis>> => ({
			ok: false,
			status: 400,
			code: 'x',
			message: `not in tests: ${structure}`
		}))
	};
	const editor = new RouteEditor(
		{
			routeId: 'r',
			projectId: 'p',
			version: 1,
			document,
			canEdit,
			analyses,
			library: library && { teamId: library[0]?.teamId ?? LIBRARY_TEAM, entries: library },
			canSaveConditions,
			// The page load sends the labels; none in a test that does not name them.
			labels: { conditions: labels ?? [], groups: new Map(), protectingGroups: new Map() }
		},
		client as unknown as RouteClient,
		new Toasts()
	);
	await editor.start();
	await editor.check.refresh();
	return { editor, client };
}

/** Renders `component` with `props` under `editor` (and a review state: none by default) in context. */
export function renderWithEditor<Props extends Record<string, unknown>>(
	editor: RouteEditor,
	component: Component<Props>,
	props: Props,
	review: ReviewState = makeReview(fakeReviewApi([])).review
) {
	return render(WithRouteEditor, {
		props: {
			editor,
			review,
			component: component as unknown as Component<Record<string, unknown>>,
			props
		}
	});
}
