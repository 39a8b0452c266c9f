// The pool's settings come from the environment with the defaults the README documents.
import { availableParallelism } from 'node:os';
import { afterEach, describe, expect, it } from 'vitest';
import { chemPoolConfig } from '../../src/lib/server/chem-pool/config';

const NAMES = ['THREADS', 'BUDGET_MS', 'PAGE_BUDGET_MS', 'QUEUE', 'WORKER_HEAP_MB'].map(
	(n) => `ORTHOGON_CHEM_${n}`
);
afterEach(() => NAMES.forEach((name) => delete process.env[name]));

describe('chemistry pool settings', () => {
	it('defaults: one core left to requests, 10 s per request, 4 s for page drawings, 64 waiting, 512 MB', () => {
		expect(chemPoolConfig()).toEqual({
			threads: Math.max(1, availableParallelism() - 1),
			budgetMs: 10_000,
			pageBudgetMs: 4_000,
			maxQueue: 64,
			workerHeapMb: 512
		});
	});
	it('reads the environment; below a minimum is raised to it, and text that is no number is ignored', () => {
		process.env.ORTHOGON_CHEM_THREADS = '3';
		process.env.ORTHOGON_CHEM_BUDGET_MS = '2500';
		process.env.ORTHOGON_CHEM_QUEUE = '0';
		process.env.ORTHOGON_CHEM_WORKER_HEAP_MB = '32';
		process.env.ORTHOGON_CHEM_PAGE_BUDGET_MS = 'soon';
		expect(chemPoolConfig()).toMatchObject({
			threads: 3,
			budgetMs: 2500,
			maxQueue: 0,
			workerHeapMb: 256,
			pageBudgetMs: 4_000
		});
	});
});
