#!/usr/bin/env node
// The JavaScript a page loads before it is interactive: Kit's client entry, the app, the page's
// layout and leaf nodes, and every chunk they import statically — gzip-compressed, as a browser
// receives it. Dynamic imports (the structure editor, dagre) are listed apart, since they load later.
//
//   node scripts/start.js --build-only && node scripts/bench/bundle-size.js [/routes/[routeId=uuid]] [--max-kb 300]

import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

const args = process.argv.slice(2);
const routeId = args.find((a) => a.startsWith('/')) ?? '/routes/[routeId=uuid]';
const maxAt = args.indexOf('--max-kb');
const maxKb = maxAt >= 0 ? Number(args[maxAt + 1]) : 300;

const out = '.svelte-kit/output';
const manifest = JSON.parse(fs.readFileSync(path.join(out, 'client/.vite/manifest.json'), 'utf8'));
const serverManifest = fs.readFileSync(path.join(out, 'server/manifest-full.js'), 'utf8');

const escaped = routeId.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const found = new RegExp(
	`id: "${escaped}",[\\s\\S]*?page: \\{ layouts: \\[([^\\]]*)\\], errors: \\[[^\\]]*\\], leaf: (\\d+) \\}`
).exec(serverManifest);
if (!found) {
	console.error(
		`No page route "${routeId}" in the build; run node scripts/start.js --build-only first.`
	);
	process.exit(2);
}
const nodes = [...found[1].split(',').filter(Boolean).map(Number), Number(found[2])];
const entryKeys = [
	'node_modules/@sveltejs/kit/src/runtime/client/entry.js',
	'.svelte-kit/generated/client-optimized/app.js',
	...nodes.map((n) => `.svelte-kit/generated/client-optimized/nodes/${n}.js`)
];

const initial = new Set();
const later = new Set();
const visit = (key) => {
	const chunk = manifest[key];
	if (!chunk || initial.has(chunk.file)) {
		return;
	}
	initial.add(chunk.file);
	for (const next of chunk.imports ?? []) {
		visit(next);
	}
	// The app entry's dynamic imports are the other pages' nodes, not this page's lazy parts.
	if (key.endsWith('/app.js')) {
		return;
	}
	for (const next of chunk.dynamicImports ?? []) {
		if (manifest[next]) {
			later.add(next);
		}
	}
};
entryKeys.forEach(visit);

const gzip = (file) =>
	zlib.gzipSync(fs.readFileSync(path.join(out, 'client', file)), { level: 9 }).length;
const kb = (bytes) => (bytes / 1024).toFixed(1);
const sizes = [...initial]
	.map((file) => ({ file, bytes: gzip(file) }))
	.sort((a, b) => b.bytes - a.bytes);
const total = sizes.reduce((sum, s) => sum + s.bytes, 0);

console.log(
	`Initial JavaScript of ${routeId}: ${sizes.length} files, ${kb(total)} KB gzip (budget ${maxKb} KB)`
);
for (const { file, bytes } of sizes.slice(0, 8)) {
	console.log(`  ${kb(bytes).padStart(7)} KB  ${file}`);
}
const lazy = [...later].map((key) => manifest[key]).filter((c) => !initial.has(c.file));
for (const chunk of lazy) {
	const own = [
		chunk.file,
		...(chunk.imports ?? []).map((k) => manifest[k]?.file).filter((f) => f && !initial.has(f))
	];
	const bytes = own.reduce((sum, f) => sum + gzip(f), 0);
	console.log(`  loaded later: ${kb(bytes).padStart(7)} KB  ${chunk.src ?? chunk.file}`);
}
process.exit(total / 1024 <= maxKb ? 0 : 1);
