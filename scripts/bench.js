#!/usr/bin/env node
// `npm run bench [-- name …]`: runs each benchmark module in scripts/bench/ in its own process
// (so one benchmark's JIT warm-up and caches never flatter the next) and lets it print its figures.
// Add a benchmark by writing scripts/bench/<name>.ts and listing it below.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import path from 'node:path';
import { buildIfStale } from './build-if-stale.js';

const BENCHMARKS = [
	{
		name: 'perception',
		file: 'perception.ts',
		about: 'groups and PGs of a 30-intermediate route, ours vs RDKit-WASM'
	},
	{
		name: 'check',
		file: 'check-route.ts',
		about: 'the clash check over a 30-step route, cold and warm'
	},
	{
		name: 'plan',
		file: 'plan.ts',
		about: 'the strategy planner on a route with 10 sensitive group instances (aim ≤ 250 ms)'
	},
	{
		name: 'limits',
		file: 'limits.ts',
		about:
			'the largest structure each chemistry endpoint accepts, its time through the worker pool, and the pool overhead per call'
	},
	{
		name: 'bundle',
		file: 'bundle-size.js',
		about: "the route page's initial JavaScript, gzip (budget 300 KB)",
		needsBuild: true
	}
];

const root = path.dirname(path.dirname(fileURLToPath(import.meta.url)));
const wanted = process.argv.slice(2);
const unknown = wanted.filter((name) => !BENCHMARKS.some((b) => b.name === name));
if (unknown.length > 0) {
	console.error(
		`Unknown benchmark(s): ${unknown.join(', ')}. Known: ${BENCHMARKS.map((b) => b.name).join(', ')}.`
	);
	process.exit(2);
}

let failed = 0;
for (const bench of BENCHMARKS.filter((b) => wanted.length === 0 || wanted.includes(b.name))) {
	console.log(`\n▶ ${bench.name}: ${bench.about}`);
	if (bench.needsBuild) {
		buildIfStale();
	}
	const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
	const result = spawnSync(tsx, [path.join(root, 'scripts', 'bench', bench.file)], {
		cwd: root,
		stdio: 'inherit'
	});
	if (result.status !== 0) {
		failed += 1;
		console.error(`✗ ${bench.name} exited with ${result.status ?? result.signal}`);
	}
}
process.exit(failed === 0 ? 0 : 1);
