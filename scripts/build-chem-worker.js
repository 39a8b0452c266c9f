// Bundles the chemistry worker (src/lib/server/chem-pool/worker.ts) into one ES module that a
// piscina worker thread loads with plain Node: no Vite, no TypeScript loader, no dev packages at
// run time. Used by the build (into build/), by `vite dev` and Vitest (vite.config.ts) and by the
// benchmarks (into node_modules/.cache/orthogon/).
import { buildSync } from 'esbuild';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));

/** Where dev servers, tests and benchmarks find the worker (the pool looks here last). */
export const DEV_WORKER_FILE = path.join(
	root,
	'node_modules',
	'.cache',
	'orthogon',
	'chem-worker.mjs'
);

/** Bundles the worker to `outfile` (default: the dev location) and returns the path. */
export function buildChemWorker(outfile = DEV_WORKER_FILE) {
	// Written aside and renamed, so a worker starting meanwhile never loads half a file.
	const partial = `${outfile}.${process.pid}.tmp`;
	buildSync({
		entryPoints: [path.join(root, 'src', 'lib', 'server', 'chem-pool', 'worker.ts')],
		outfile: partial,
		bundle: true,
		platform: 'node',
		format: 'esm',
		target: 'node20',
		// Some bundled packages are CommonJS and call require() for Node built-ins.
		banner: {
			js: "import { createRequire } from 'node:module'; const require = createRequire(import.meta.url);"
		},
		logLevel: 'warning',
		legalComments: 'none'
	});
	fs.renameSync(partial, outfile);
	return outfile;
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
	const started = Date.now();
	const file = buildChemWorker(process.argv[2] ? path.resolve(process.argv[2]) : undefined);
	console.log(
		`Chemistry worker bundled to ${path.relative(process.cwd(), file)} in ${Date.now() - started} ms.`
	);
}
