// One piscina pool runs every chemistry call of this process off the request thread, so a slow
// structure delays only its own answer. Each call gets a time budget (queueing included); an
// over-budget call is aborted, which terminates its worker, and answers 503. A full queue answers
// 503 with retry-after; a worker that runs out of heap answers 422. See DEVELOPERS.md.

import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import { ApiFailure } from '../api';
import { chemPoolConfig } from './config';
import type { ChemistryTask, TaskInput, TaskOutput } from './tasks';
import type { WorkerAnswer, WorkerRequest } from './worker';

const WORKER_FILE = 'chem-worker.mjs';

/**
 * The bundled worker: ORTHOGON_CHEM_WORKER, else next to the server build (build/ holds it beside
 * index.js, a few folders above the chunk this code runs in), else the dev copy that `vite dev`,
 * Vitest and the benchmarks bundle into node_modules/.cache/orthogon/.
 */
export function chemWorkerFile(): string {
	if (process.env.ORTHOGON_CHEM_WORKER) {
		return path.resolve(process.env.ORTHOGON_CHEM_WORKER);
	}
	let dir = path.dirname(fileURLToPath(import.meta.url));
	for (let up = 0; up < 4; up++, dir = path.dirname(dir)) {
		const candidate = path.join(dir, WORKER_FILE);
		if (fs.existsSync(candidate)) {
			return candidate;
		}
	}
	const dev = path.resolve('node_modules', '.cache', 'orthogon', WORKER_FILE);
	if (fs.existsSync(dev)) {
		return dev;
	}
	throw new Error(
		`The chemistry worker (${WORKER_FILE}) was not found; run \`npm run build\` or \`node scripts/build-chem-worker.js\`.`
	);
}

// Vite's dev server re-evaluates server modules on edits: keep one pool per process.
const POOL = Symbol.for('orthogon.chemPool');
type Pool = Piscina<WorkerRequest, WorkerAnswer>;
type Holder = { [POOL]?: Pool };

// Tasks submitted and not yet settled. piscina's own maxQueue does not apply to tasks that carry
// an AbortSignal (they wait in a separate queue), so the queue bound is kept here.
const inFlight = new WeakMap<Pool, number>();

function pool(): Pool {
	const holder = globalThis as Holder;
	if (holder[POOL]) {
		return holder[POOL];
	}
	const config = chemPoolConfig();
	const created = new Piscina<WorkerRequest, WorkerAnswer>({
		filename: chemWorkerFile(),
		minThreads: 1,
		maxThreads: config.threads,
		idleTimeout: 60_000,
		resourceLimits: { maxOldGenerationSizeMb: config.workerHeapMb }
	});
	// A worker that dies between tasks is replaced; without a listener the event would end the process.
	created.on('error', (caught: unknown) => console.error('[chem-pool] worker failed', caught));
	holder[POOL] = created;
	return created;
}

export type RunOptions = { budgetMs?: number };

/**
 * Runs a chemistry task on the pool, e.g. `await runChemistry('analyze', { text: 'CCO', options: {} })`.
 * Refusals throw ApiFailure 422; an over-budget task 503 `chemistry_timeout`; a full queue 503
 * `chemistry_busy` with retry-after; a worker out of heap 422 `chemistry_too_complex`.
 */
export async function runChemistry<K extends ChemistryTask>(
	task: K,
	input: TaskInput<K>,
	options: RunOptions = {}
): Promise<TaskOutput<K>> {
	const config = chemPoolConfig();
	const budgetMs = options.budgetMs ?? config.budgetMs;
	const current = pool();
	const running = inFlight.get(current) ?? 0;
	if (running >= current.options.maxThreads + config.maxQueue) {
		throw busy();
	}
	inFlight.set(current, running + 1);
	let answer: WorkerAnswer;
	try {
		answer = await current.run({ task, input }, { signal: AbortSignal.timeout(budgetMs) });
	} catch (caught) {
		throw unavailable(caught, budgetMs) ?? caught;
	} finally {
		inFlight.set(current, (inFlight.get(current) ?? 1) - 1);
	}
	if (!answer.ok) {
		const { status, code, message, details } = answer.refusal;
		throw new ApiFailure(status, code, message, details);
	}
	return answer.value as TaskOutput<K>;
}

function unavailable(caught: unknown, budgetMs: number): ApiFailure | null {
	const error = caught as { name?: string; message?: string; code?: string };
	if (error?.name === 'AbortError') {
		return new ApiFailure(
			503,
			'chemistry_timeout',
			`The chemistry for this request took longer than ${seconds(budgetMs)} and was stopped; nothing was checked. Smaller structures or fewer steps at a time will fit.`,
			{ budgetMs }
		);
	}
	if (error?.message === 'Task queue is at limit') {
		return busy();
	}
	if (error?.code === 'ERR_WORKER_OUT_OF_MEMORY') {
		return new ApiFailure(
			422,
			'chemistry_too_complex',
			'This request needed more memory than a chemistry worker may use, and was stopped; nothing was checked.'
		);
	}
	return null;
}

function busy(): ApiFailure {
	return new ApiFailure(
		503,
		'chemistry_busy',
		'The chemistry workers are busy with other requests; nothing was checked. Try again in a few seconds.',
		undefined,
		{ 'retry-after': '5' }
	);
}

const seconds = (ms: number) =>
	ms >= 1000 ? `${(ms / 1000).toFixed(ms % 1000 ? 1 : 0)} s` : `${ms} ms`;

/** Stops the pool's workers (tests, shutdown), e.g. `await closeChemistryPool()`. */
export async function closeChemistryPool(): Promise<void> {
	const holder = globalThis as Holder;
	const current = holder[POOL];
	delete holder[POOL];
	await current?.destroy();
}
