// Builds the app when build/ is missing or older than anything it is built from.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const STAMP = 'build/.built-at';
const SOURCES = ['src', 'static', 'rules'];
const CONFIG_FILES = ['package.json', 'package-lock.json', 'svelte.config.js', 'vite.config.ts', 'tailwind.config.ts', 'tsconfig.json'];

function newestMtime(entry) {
	if (!fs.existsSync(entry)) return 0;
	const stat = fs.statSync(entry);
	if (!stat.isDirectory()) return stat.mtimeMs;
	let newest = stat.mtimeMs;
	for (const child of fs.readdirSync(entry)) newest = Math.max(newest, newestMtime(path.join(entry, child)));
	return newest;
}

export function buildIsStale() {
	if (!fs.existsSync('build/index.js') || !fs.existsSync(STAMP)) return true;
	const built = fs.statSync(STAMP).mtimeMs;
	return [...SOURCES, ...CONFIG_FILES].some((entry) => newestMtime(entry) > built);
}

export function buildIfStale({ force = false } = {}) {
	if (!force && !buildIsStale()) return;
	console.log('Building Orthogon (the first start takes a few seconds)…');
	const result = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit' });
	if (result.status !== 0) {
		console.error('The build failed; see the messages above.');
		process.exit(result.status ?? 1);
	}
	fs.writeFileSync(STAMP, new Date().toISOString() + '\n');
}
