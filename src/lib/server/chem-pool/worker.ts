// The chemistry worker: piscina calls the default export with one task at a time. Refusals come
// back as values (they must keep their code and details across threads); anything else thrown is
// a bug and reaches the request side as an error. Bundled by scripts/build-chem-worker.js.

import { refusalOf, type Refusal } from './refusals';
import { chemistryTasks, type ChemistryTask } from './tasks';

export type WorkerRequest = { task: ChemistryTask; input: unknown };
export type WorkerAnswer = { ok: true; value: unknown } | { ok: false; refusal: Refusal };

export default function runTask({ task, input }: WorkerRequest): WorkerAnswer {
	const run = chemistryTasks[task] as (input: unknown) => unknown;
	if (typeof run !== 'function') {
		throw new Error(`Unknown chemistry task “${String(task)}”.`);
	}
	try {
		return { ok: true, value: run(input) };
	} catch (caught) {
		const refusal = refusalOf(caught);
		if (refusal) {
			return { ok: false, refusal };
		}
		throw caught;
	}
}
