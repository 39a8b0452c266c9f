// Browser calls for the route map and the project's route list. Each method owns the user-facing
// message for its failures (a toast) except where the page shows the failure in place: a save
// conflict (the conflict notice) and an unreadable structure (the field's error).

import type {
	AnalyzeAnswer as Analysis,
	CheckAnswer,
	CreatedRouteAnswer,
	CreatedSavedConditionAnswer,
	ImportedRouteAnswer,
	LibraryAnswer,
	PlanAnswer,
	RouteAnswer,
	RulesAnswer,
	SavedPlanAnswer,
	SavedRouteAnswer,
	StepCheck
} from '$lib/api/answers';
import type { NewSavedConditionRequest } from '$lib/library/contract';
import type { RouteDocument } from '$lib/route/document';
import { callApi, isVersionConflict, jsonBody, type ApiResult } from './api';
import type { Toasts } from './toasts.svelte';

// The answers as the server defines them (types only: no server or chemistry code ships); the
// route map's components take them from here.
export type { Clash } from '$lib/api/answers';
export type { Analysis, PlanAnswer, RouteAnswer, StepCheck };
/** A condition class as the route map shows it: `{ id: 'base-aqueous', label: 'Aqueous base' }`. */
export type ConditionLabel = Pick<RulesAnswer['conditions'][number], 'id' | 'label'>;
/** Readable names for the rule table's ids: free groups and protecting groups. */
export type RuleLabels = { groups: Map<string, string>; protectingGroups: Map<string, string> };

export class RouteClient {
	constructor(
		private readonly toasts: Toasts,
		private readonly fetcher: typeof fetch = fetch
	) {}

	load(routeId: string): Promise<ApiResult<RouteAnswer>> {
		return this.#call<RouteAnswer>(`/api/routes/${routeId}`, {}, 'The route could not be loaded');
	}

	/** A version conflict is left to the caller (the conflict notice); other failures are toasted. */
	async save(
		routeId: string,
		version: number,
		document: RouteDocument
	): Promise<ApiResult<SavedRouteAnswer>> {
		const result = await callApi<SavedRouteAnswer>(
			`/api/routes/${routeId}`,
			jsonBody('PUT', { version, document }),
			this.fetcher
		);
		if (!result.ok && !isVersionConflict(result)) {
			this.toasts.show(`Not saved: ${result.message}`, 'problem');
		}
		return result;
	}

	async create(projectId: string, document: RouteDocument): Promise<string | null> {
		const result = await this.#call<CreatedRouteAnswer>(
			`/api/projects/${projectId}/routes`,
			jsonBody('POST', document),
			'The route could not be created'
		);
		return result.ok ? result.data.id : null;
	}

	/**
	 * The clash check of the stored route by step id. A failure is not toasted: the map keeps
	 * saying, in place, that nothing is checked until a check succeeds.
	 */
	async check(routeId: string): Promise<ApiResult<Map<string, StepCheck>>> {
		const result = await callApi<CheckAnswer>(`/api/routes/${routeId}/check`, {}, this.fetcher);
		return result.ok
			? { ...result, data: new Map(result.data.steps.map((step) => [step.id, step])) }
			: result;
	}

	/** Unreadable structures come back as failures for the caller to show beside the field. */
	analyze(structure: string, highlight?: string): Promise<ApiResult<Analysis>> {
		return callApi<Analysis>(
			'/api/analyze',
			jsonBody('POST', { structure, depict: true, ...(highlight ? { highlight } : {}) }),
			this.fetcher
		);
	}

	/** The ranked plans for the stored route; failures are shown in the plans dialog, not toasted. */
	plan(routeId: string): Promise<ApiResult<PlanAnswer>> {
		return callApi<PlanAnswer>(`/api/routes/${routeId}/plan`, { method: 'POST' }, this.fetcher);
	}

	/**
	 * Saves plan `rank` of the route at `version` as a new route; a version conflict (the route
	 * changed since the plans were made) is left to the caller, which plans again; other failures
	 * are toasted.
	 */
	async savePlan(
		routeId: string,
		rank: number,
		version: number
	): Promise<ApiResult<SavedPlanAnswer>> {
		const result = await callApi<SavedPlanAnswer>(
			`/api/routes/${routeId}/plan/${rank}/save`,
			jsonBody('POST', { version }),
			this.fetcher
		);
		if (!result.ok && !isVersionConflict(result)) {
			this.toasts.show(`Plan ${rank} was not saved: ${result.message}`, 'problem');
		}
		return result;
	}

	/** The team's saved conditions; null (and a toast) when they could not be read. */
	async library(teamId: string): Promise<LibraryAnswer['conditions'] | null> {
		const result = await this.#call<LibraryAnswer>(
			`/api/library?teamId=${encodeURIComponent(teamId)}`,
			{},
			'The condition library could not be read'
		);
		return result.ok ? result.data.conditions : null;
	}

	/** A refusal (a field, a role) is shown where the chemist saved, not toasted. */
	saveCondition(body: NewSavedConditionRequest): Promise<ApiResult<CreatedSavedConditionAnswer>> {
		return callApi(`/api/library`, jsonBody('POST', body), this.fetcher);
	}

	async importFile(projectId: string, file: File): Promise<string | null> {
		const form = new FormData();
		form.set('file', file);
		const result = await this.#call<ImportedRouteAnswer>(
			`/api/projects/${projectId}/routes/import`,
			{ method: 'POST', body: form },
			`“${file.name}” was not imported`
		);
		return result.ok ? result.data.id : null;
	}

	async #call<T>(url: string, init: RequestInit, failure: string): Promise<ApiResult<T>> {
		const result = await callApi<T>(url, init, this.fetcher);
		if (!result.ok) {
			this.toasts.show(`${failure}: ${result.message}`, 'problem');
		}
		return result;
	}
}
