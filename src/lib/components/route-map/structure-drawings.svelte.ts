// Depictions and formulas of the route's structures, fetched once per structure and highlight and
// shared by every node and panel that shows the same structure.

import { SvelteMap } from 'svelte/reactivity';
import type { Analysis, RouteClient } from '$lib/client/route-client';

export type AnalysisState =
	| { status: 'loading' }
	| { status: 'ready'; analysis: Analysis }
	| { status: 'failed'; message: string };

const key = (structure: string, highlight: string) => `${highlight}\u0000${structure}`;

export class StructureDrawings {
	#analyses = new SvelteMap<string, AnalysisState>();

	constructor(
		private readonly client: RouteClient,
		/** Analyses the page load already holds, by structure (no highlight). */
		known: Record<string, Analysis> = {}
	) {
		for (const [structure, analysis] of Object.entries(known)) {
			this.#analyses.set(key(structure, ''), { status: 'ready', analysis });
		}
	}

	analysis(structure: string, highlight = ''): AnalysisState | undefined {
		return this.#analyses.get(key(structure, highlight));
	}

	/** Starts fetching a depiction unless one is cached or on its way; call from an effect. */
	ensure(structure: string, highlight = '') {
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
}
