// The "Plan protection" dialog's state: ask the server for ranked plans of the stored route (after
// saving what is on the page, so the plans match the map) and save a chosen plan as a new route.

import { isVersionConflict } from '$lib/client/api';
import type { PlanAnswer, RouteClient } from '$lib/client/route-client';
import type { Toasts } from '$lib/client/toasts.svelte';
import type { RouteEditor } from './route-editor.svelte';

export type PlansView =
	| { status: 'closed' }
	| { status: 'loading' }
	| { status: 'failed'; message: string }
	/** `version` is the route version the plans were made for; saving one sends it back. */
	| { status: 'ready'; answer: PlanAnswer; version: number };

export class ProtectionPlans {
	#view = $state.raw<PlansView>({ status: 'closed' });
	#saving = $state<number | null>(null);
	// Each opening gets a number, so an answer that arrives after a close or a newer opening is dropped.
	#request = 0;

	constructor(
		private readonly editor: RouteEditor,
		private readonly client: RouteClient,
		private readonly toasts: Toasts
	) {}

	get view() {
		return this.#view;
	}
	get isOpen() {
		return this.#view.status !== 'closed';
	}
	/** The rank being saved, or null. */
	get saving() {
		return this.#saving;
	}
	/** Group and protecting-group names, which came with the page. */
	get labels() {
		return this.editor.ruleLabels;
	}

	async open() {
		const request = ++this.#request;
		this.#view = { status: 'loading' };
		if (!(await this.editor.flush())) {
			if (request === this.#request) {
				this.#view = { status: 'failed', message: this.#unsaved() };
			}
			return;
		}
		const version = this.editor.version;
		const result = await this.client.plan(this.editor.routeId);
		if (request !== this.#request) {
			return;
		}
		this.#view = result.ok
			? { status: 'ready', answer: result.data, version }
			: { status: 'failed', message: result.message };
	}

	close() {
		this.#request++;
		this.#view = { status: 'closed' };
	}

	/** Saves plan `rank` as a new route and returns its id (to open it), or null. */
	async use(rank: number): Promise<string | null> {
		const view = this.#view;
		if (view.status !== 'ready' || this.#saving !== null) {
			return null;
		}
		this.#saving = rank;
		const result = await this.client.savePlan(this.editor.routeId, rank, view.version);
		this.#saving = null;
		if (result.ok) {
			this.toasts.show(`Plan ${rank} is saved as “${result.data.name}”.`, 'success');
			return result.data.id;
		}
		if (isVersionConflict(result)) {
			this.#view = {
				status: 'failed',
				message:
					'Someone else changed this route after these plans were made, so they may no longer fit. Reload the page to see the route as it is now, then plan again.'
			};
		}
		return null;
	}

	#unsaved(): string {
		return this.editor.saveState === 'conflict'
			? 'Someone else changed this route while you were editing it. Settle that first (see the notice above the map), then plan again.'
			: `Your latest changes are not saved${this.editor.failure ? ` (${this.editor.failure})` : ''}, so plans would not match the map. Retry the save, then plan again.`;
	}
}
