// The clash check of the stored route, refreshed after each save. Until the first answer arrives
// (or when it fails, which the client says in a toast) no step has a check: the map shows no
// verdict rather than a reassuring one.

import type { RouteClient, StepCheck } from '$lib/client/route-client';

export class ClashCheck {
	#steps = $state.raw<Map<string, StepCheck> | null>(null);

	constructor(
		private readonly routeId: string,
		private readonly client: RouteClient
	) {}

	/** Whether a check answer has arrived. */
	get loaded() {
		return this.#steps !== null;
	}

	/** One step's answer; undefined before the first answer or for a step saved after it. */
	of(stepId: string): StepCheck | undefined {
		return this.#steps?.get(stepId);
	}

	async refresh() {
		const steps = await this.client.check(this.routeId);
		if (steps !== null) {
			this.#steps = steps;
		}
	}
}
