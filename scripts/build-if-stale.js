// Builds the app when build/ is missing or older than anything it is built from.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { buildChemWorker } from './build-chem-worker.js';

const STAMP = 'build/.built-at';
const SOURCES = ['src', 'static', 'rules'];
const CONFIG_FILES = [
	'package.json',
	'package-lock.json',
	'svelte.config.js',
	'vite.config.ts',
	'tailwind.config.ts',
	'tsconfig.json'
];

function newestMtime(entry) {
	if (!fs.existsSync(entry)) {
		return 0;
	}
	const stat = fs.statSync(entry);
	if (!stat.isDirectory()) {
		return stat.mtimeMs;
	}
	let newest = stat.mtimeMs;
	for (const child of fs.readdirSync(entry)) {
		newest = Math.max(newest, newestMtime(path.join(entry, child)));
	}
	return newest;
}

export function buildIsStale() {
	if (!fs.existsSync('build/index.js') || !fs.existsSync(STAMP)) {
		return true;
	}
	const built = fs.statSync(STAMP).mtimeMs;
	return [...SOURCES, ...CONFIG_FILES].some((entry) => newestMtime(entry) > built);
}

export function buildIfStale({ force = false } = {}) {
	if (!force && !buildIsStale()) {
		return;
	}
	console.log('Building Orthogon (the first start takes a few seconds)…');
	const started = Date.now();
	// The server bundler's notes about dependencies' internals are noise on success; the whole
	// log is shown when the build fails.
	const result = spawnSync('npx', ['vite', 'build'], {
		encoding: 'utf8',
		maxBuffer: 64 * 1024 * 1024
	});
	if (result.status !== 0) {
		process.stdout.write(result.stdout ?? '');
		process.stderr.write(result.stderr ?? '');
		console.error('The build failed; see the messages above.');
		process.exit(result.status ?? 1);
	}
	// The chemistry worker runs in worker threads outside the server bundle (src/lib/server/chem-pool).
	buildChemWorker(path.resolve('build', 'chem-worker.mjs'));
	fs.writeFileSync(STAMP, new Date().toISOString() + '\n');
	console.log(`Built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}
