// Browser calls for the route map and the project's route list. Each method owns the user-facing
// message for its failures (a toast) except where the page shows the failure in place: a save
// conflict (the conflict notice) and an unreadable structure (the field's error).

import type { Analysis } from '$lib/chem/analyze';
import type { RouteDocument } from '$lib/route/document';
import type { CheckAnswer, Clash, StepCheck } from '$lib/rules/check/types';
import type { CheckedPlanAnswer as PlanAnswer } from '$lib/rules/plan';
import { callApi, jsonBody, type ApiResult } from './api';
import type { Toasts } from './toasts.svelte';

// The /api/analyze answer, as the chemistry core defines it (a type only: no chemistry code ships).
export type { Analysis };

// The check answer as the chemistry core defines it and the endpoints send it (types only).
export type { Clash, StepCheck };
export type RouteAnswer = {
	id: string;
	projectId: string;
	name: string;
	status: string;
	version: number;
	document: RouteDocument;
};
export type ConditionLabel = { id: string; label: string };
/** Readable names for the rule table's ids: free groups and protecting groups. */
export type RuleLabels = { groups: Map<string, string>; protectingGroups: Map<string, string> };
export type { PlanAnswer };

export class RouteClient {
	constructor(
		private readonly toasts: Toasts,
		private readonly fetcher: typeof fetch = fetch
	) {}

	load(routeId: string): Promise<ApiResult<RouteAnswer>> {
		return this.#call<RouteAnswer>(`/api/routes/${routeId}`, {}, 'The route could not be loaded');
	}

	/** A 409 is left to the caller (the conflict notice); other failures are toasted. */
	async save(
		routeId: string,
		version: number,
		document: RouteDocument
	): Promise<ApiResult<{ version: number }>> {
		const result = await callApi<{ version: number }>(
			`/api/routes/${routeId}`,
			jsonBody('PUT', { version, document }),
			this.fetcher
		);
		if (!result.ok && result.status !== 409) {
			this.toasts.show(`Not saved: ${result.message}`, 'problem');
		}
		return result;
	}

	async create(projectId: string, document: RouteDocument): Promise<string | null> {
		const result = await this.#call<{ id: string }>(
			`/api/projects/${projectId}/routes`,
			jsonBody('POST', document),
			'The route could not be created'
		);
		return result.ok ? result.data.id : null;
	}

	/** The clash check of the stored route; `'unavailable'` while the server has no check endpoint. */
	async check(routeId: string): Promise<Map<string, StepCheck> | 'unavailable' | null> {
		const result = await callApi<CheckAnswer>(`/api/routes/${routeId}/check`, {}, this.fetcher);
		if (!result.ok) {
			if (result.status === 404) {
				return 'unavailable';
			}
			this.toasts.show(`The clash check failed: ${result.message}`, 'problem');
			return null;
		}
		return new Map(result.data.steps.map((step) => [step.id, step]));
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
	 * Saves plan `rank` of the route at `version` as a new route; a 409 (the route changed since
	 * the plans were made) is left to the caller, which plans again; other failures are toasted.
	 */
	async savePlan(
		routeId: string,
		rank: number,
		version: number
	): Promise<ApiResult<{ id: string; name: string }>> {
		const result = await callApi<{ id: string; name: string }>(
			`/api/routes/${routeId}/plan/${rank}/save`,
			jsonBody('POST', { version }),
			this.fetcher
		);
		if (!result.ok && result.status !== 409) {
			this.toasts.show(`Plan ${rank} was not saved: ${result.message}`, 'problem');
		}
		return result;
	}

	async importFile(projectId: string, file: File): Promise<string | null> {
		const form = new FormData();
		form.set('file', file);
		const result = await this.#call<{ id: string }>(
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
