// The pool's settings, from the environment with documented defaults (README, "Configuration").
import { availableParallelism } from 'node:os';

/** A whole number from the environment: unset or not a number → the default; below `min` → `min`. */
function fromEnv(name: string, fallback: number, min: number): number {
	const raw = process.env[name];
	if (raw === undefined || raw.trim() === '') {
		return fallback;
	}
	const value = Number(raw);
	return Number.isFinite(value) ? Math.max(min, Math.floor(value)) : fallback;
}

export type ChemPoolConfig = {
	/** Worker threads; the default leaves one core to the request thread. */
	threads: number;
	/** Wall time one request's chemistry may take, queueing included, before it is stopped. */
	budgetMs: number;
	/** Wall time the route page may spend drawing its intermediates before it is sent without them. */
	pageBudgetMs: number;
	/** Tasks that may wait for a thread; beyond this, requests get 503 with retry-after. */
	maxQueue: number;
	/** Old-generation heap of one worker; a runaway allocation ends that worker only. */
	workerHeapMb: number;
};

/** The settings now in the environment, e.g. `chemPoolConfig().budgetMs` → 10000. */
export function chemPoolConfig(): ChemPoolConfig {
	return {
		threads: fromEnv('ORTHOGON_CHEM_THREADS', Math.max(1, availableParallelism() - 1), 1),
		budgetMs: fromEnv('ORTHOGON_CHEM_BUDGET_MS', 10_000, 1),
		pageBudgetMs: fromEnv('ORTHOGON_CHEM_PAGE_BUDGET_MS', 4_000, 1),
		maxQueue: fromEnv('ORTHOGON_CHEM_QUEUE', 64, 0),
		// At least 256 MB: openchemlib, the rule table and the caches (CACHE_BYTES) need about 150.
		workerHeapMb: fromEnv('ORTHOGON_CHEM_WORKER_HEAP_MB', 512, 256)
	};
}
