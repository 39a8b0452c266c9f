// The browser's calls for the quantities table and the water-removal card (issue 14's contract).

import type { QuantitiesAnswer, QuantitiesRequest, WaterLayer } from '$lib/quantities/contract';
import { callApi, jsonBody, type ApiResult } from './api';

/** A solvent the trap can use, as `GET /api/azeotropes` lists it (the fields the picker needs). */
export type AzeotropeOption = {
	id: string;
	name: string;
	boilingPoint?: number;
	waterLayer?: WaterLayer;
};

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
		const result = await callApi<{ azeotropes?: unknown }>('/api/azeotropes', {}, this.fetcher);
		if (!result.ok) {
			return {
				unavailable:
					result.status === 404
						? 'The solvent list is not available on this server yet.'
						: `The solvent list could not be loaded: ${result.message}`
			};
		}
		const rows = Array.isArray(result.data.azeotropes) ? result.data.azeotropes : [];
		return rows.flatMap((row: Record<string, unknown>) => {
			const id = typeof row.id === 'string' ? row.id : row.solvent;
			if (typeof id !== 'string') {
				return [];
			}
			return [
				{
					id,
					name: typeof row.name === 'string' ? row.name : id,
					...(typeof row.boilingPoint === 'number' ? { boilingPoint: row.boilingPoint } : {}),
					...(row.waterLayer === 'lower' || row.waterLayer === 'upper'
						? { waterLayer: row.waterLayer }
						: {})
				}
			];
		});
	}
}
