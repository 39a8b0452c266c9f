// The browser's calls for the quantities table and the water-removal card (issue 14's contract).

import type { AzeotropesAnswer, QuantitiesAnswer } from '$lib/api/answers';
import type { QuantitiesRequest } from '$lib/quantities/contract';
import type { Azeotrope } from '$lib/rules/azeotropes';
import { callApi, jsonBody, type ApiResult } from './api';

/** A solvent the trap can use, as `GET /api/azeotropes` lists it. */
export type AzeotropeOption = Azeotrope;

export type AzeotropeList = AzeotropeOption[] | { unavailable: string };

export class QuantitiesClient {
	constructor(private readonly fetcher: typeof fetch = fetch) {}

	/** Refusals come back as values; the caller places them on their rows. */
	compute(request: QuantitiesRequest, signal?: AbortSignal): Promise<ApiResult<QuantitiesAnswer>> {
		return callApi<QuantitiesAnswer>(
			'/api/quantities',
			{ ...jsonBody('POST', request), signal },
			this.fetcher
		);
	}

	/** The solvents, or why there are none to pick (never an empty list passed off as the answer). */
	async azeotropes(): Promise<AzeotropeList> {
		const result = await callApi<AzeotropesAnswer>('/api/azeotropes', {}, this.fetcher);
		if (!result.ok) {
			return { unavailable: `The solvent list could not be loaded: ${result.message}` };
		}
		return [...result.data.azeotropes];
	}
}
