// The clash check of the stored route, refreshed after each save. Until the first answer arrives
// no step has a check: the map shows no verdict rather than a reassuring one. When a check fails
// (the chemistry service is busy, the team's rules no longer fit the table) the earlier verdicts
// are dropped, since they were for an older version, and `failure` says why until one succeeds.

import type { RouteClient, StepCheck } from '$lib/client/route-client';

export class ClashCheck {
	#steps = $state.raw<Map<string, StepCheck> | null>(null);
	#failure = $state<string | null>(null);

	constructor(
		private readonly routeId: string,
		private readonly client: Pick<RouteClient, 'check'>
	) {}

	/** Whether a check answer has arrived. */
	get loaded() {
		return this.#steps !== null;
	}

	/** Why the last check did not run, or null. */
	get failure() {
		return this.#failure;
	}

	/** One step's answer; undefined before the first answer, after a failure, or for a step saved after it. */
	of(stepId: string): StepCheck | undefined {
		return this.#steps?.get(stepId);
	}

	async refresh() {
		const result = await this.client.check(this.routeId);
		this.#steps = result.ok ? result.data : null;
		this.#failure = result.ok ? null : result.message;
	}
}
