#!/usr/bin/env node
// `npm run loadtest`: the built server on loopback with a fresh demo database, under load from
// autocannon. Prints requests/s, p50/p99 latency and errors per kind of request; the p99 of a
// cheap read while uncached checks run; and 20 parallel saves of different routes. Stops by
// itself (about two and a half minutes). LOADTEST_SECONDS shortens the main phase for a quick look.
import autocannon from 'autocannon';
import fs from 'node:fs';
import path from 'node:path';
import { buildIfStale } from './build-if-stale.js';
import { freePort, signInCookie, startBuiltServer } from './built-server.js';
import { demoSignIn } from './environment.js';

const SECONDS = Number(process.env.LOADTEST_SECONDS ?? 60);
const CONNECTIONS = 50;
const GOALS = { cheapReadP99Ms: 50, parallelSavesMs: 1000 };

/** A SMILES no earlier request used, so no cache can answer: a keto ester with a numbered side chain. */
let serial = 0;
function freshKetoEster() {
	const n = ++serial + 1;
	const chain = n
		.toString(2)
		.split('')
		.map((bit) => (bit === '1' ? 'C(C)' : 'C'))
		.join('');
	return { substrate: `CC(=O)CCC(=O)OC${chain}`, product: `CC(=O)CCC(C)(C)O` };
}
const checkBody = () => {
	const { substrate, product } = freshKetoEster();
	return JSON.stringify({
		steps: [{ id: 's1', substrate, product, reagents: 'MeMgBr (2 equiv), THF, 0 °C' }]
	});
};
const routeDocument = (name, substrate = 'CC(=O)CCC(=O)OC') => ({
	name,
	intermediates: [
		{ id: 'i0', structure: substrate },
		{ id: 'i1', structure: 'CC(=O)CCC(C)(C)O' }
	],
	steps: [{ id: 's1', from: ['i0'], to: 'i1', reagents: 'MeMgBr (2 equiv), THF' }]
});
const planBody = () => JSON.stringify(routeDocument('Load plan', freshKetoEster().substrate));

function load({ origin, cookie, path: pathname, method = 'GET', body, connections, seconds }) {
	const headers = { cookie, 'content-type': 'application/json' };
	return autocannon({
		url: origin + pathname,
		connections,
		duration: seconds,
		timeout: 30,
		requests: [
			{
				method,
				path: pathname,
				headers,
				setupRequest: (req) => (body ? { ...req, body: body() } : req)
			}
		]
	});
}

function row(kind, result) {
	const codes = Object.entries(result.statusCodeStats ?? {})
		.filter(([code]) => !code.startsWith('2'))
		.map(([code, { count }]) => `${code}×${count}`);
	const errors = [
		...codes,
		result.errors ? `connection errors×${result.errors}` : '',
		result.timeouts ? `timeouts×${result.timeouts}` : ''
	]
		.filter(Boolean)
		.join(', ');
	return {
		kind,
		'req/s': result.requests.average.toFixed(1),
		total: result.requests.total,
		'p50 ms': result.latency.p50,
		'p99 ms': result.latency.p99,
		errors: errors || 'none'
	};
}

async function parallelSaves(origin, cookie, projectId) {
	const headers = { cookie, 'content-type': 'application/json' };
	const routes = [];
	for (let i = 0; i < 20; i++) {
		const response = await fetch(`${origin}/api/projects/${projectId}/routes`, {
			method: 'POST',
			headers,
			body: JSON.stringify(routeDocument(`Save ${i}`))
		});
		routes.push((await response.json()).id);
	}
	const started = performance.now();
	const statuses = await Promise.all(
		routes.map((id, i) =>
			fetch(`${origin}/api/routes/${id}`, {
				method: 'PUT',
				headers,
				body: JSON.stringify({ version: 1, document: routeDocument(`Save ${i}, revised`) })
			}).then((r) => r.status)
		)
	);
	return { ms: Math.round(performance.now() - started), statuses };
}

buildIfStale();
const dataDir = path.resolve('test-results/loadtest-data');
fs.rmSync(dataDir, { recursive: true, force: true });
const server = await startBuiltServer({ dataDir, port: await freePort() });
const stop = () => server.stop();
process.on('SIGINT', () => void stop().then(() => process.exit(130)));
try {
	const { origin } = server;
	const cookie = await signInCookie(origin, demoSignIn('chemist').email);
	const { projects } = await (
		await fetch(`${origin}/api/projects`, { headers: { cookie } })
	).json();
	const projectId = projects.find((p) => /Cormorant/.test(p.name)).id;
	const base = { origin, cookie };
	console.log(
		`Orthogon load test on ${origin} (loopback, fresh demo database, Node ${process.version})`
	);

	console.log('\n0. The cheap read alone (5 connections, 10 s), for comparison');
	const alone = await load({ ...base, path: '/api/projects', connections: 5, seconds: 10 });
	console.table([row('read GET /api/projects, nothing else running', alone)]);

	console.log(
		`\n1. ${SECONDS} s at ${CONNECTIONS} connections: reads (30), uncached checks (10), plans (10)`
	);
	const [reads, checks, plans] = await Promise.all([
		load({ ...base, path: '/api/projects', connections: 30, seconds: SECONDS }),
		load({
			...base,
			path: '/api/check',
			method: 'POST',
			body: checkBody,
			connections: 10,
			seconds: SECONDS
		}),
		load({
			...base,
			path: '/api/plan',
			method: 'POST',
			body: planBody,
			connections: 10,
			seconds: SECONDS
		})
	]);
	console.table([
		row('read GET /api/projects', reads),
		row('check POST /api/check (uncached)', checks),
		row('plan POST /api/plan (uncached)', plans)
	]);

	console.log(`\n2. A cheap read (5 connections) while uncached checks run (10 connections), 20 s`);
	const [cheap, busy] = await Promise.all([
		load({ ...base, path: '/api/projects', connections: 5, seconds: 20 }),
		load({
			...base,
			path: '/api/check',
			method: 'POST',
			body: checkBody,
			connections: 10,
			seconds: 20
		})
	]);
	console.table([row('read while checks run', cheap), row('checks meanwhile', busy)]);
	const p99 = cheap.latency.p99;
	console.log(
		`p99 of the cheap read: ${p99} ms (goal ≤ ${GOALS.cheapReadP99Ms} ms): ${p99 <= GOALS.cheapReadP99Ms ? 'met' : 'NOT met'}`
	);

	console.log(
		'\n3. The cheap read (5 connections) while routes are written (10 connections), 15 s'
	);
	const writeBody = () => JSON.stringify(routeDocument(`Load write ${++serial}`));
	const [readDuringWrites, writes] = await Promise.all([
		load({ ...base, path: '/api/projects', connections: 5, seconds: 15 }),
		load({
			...base,
			path: `/api/projects/${projectId}/routes`,
			method: 'POST',
			body: writeBody,
			connections: 10,
			seconds: 15
		})
	]);
	console.table([
		row('read while writes run', readDuringWrites),
		row('route creates meanwhile', writes)
	]);

	console.log('\n4. 20 parallel saves of 20 different routes');
	const saves = await parallelSaves(origin, cookie, projectId);
	const ok = saves.statuses.filter((s) => s === 200).length;
	const met = ok === 20 && saves.ms <= GOALS.parallelSavesMs;
	console.log(
		`${ok}/20 answered 200 in ${saves.ms} ms (goal: all 200 within ${GOALS.parallelSavesMs} ms): ${met ? 'met' : 'NOT met'}; statuses ${[...new Set(saves.statuses)].join(', ')}`
	);
} finally {
	await stop();
}
