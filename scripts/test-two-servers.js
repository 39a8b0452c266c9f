#!/usr/bin/env node
// Two app servers on one PostgreSQL must behave as one: a session made on one is honoured by the
// other and ended for both by a sign-out; failed sign-ins counted by one are counted by both; and
// both may start (and migrate) at the same moment. `npm test` runs this after the build against
// its throwaway PostgreSQL; on its own: `node scripts/test-two-servers.js postgres://…/db`.
import { spawn } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import bcrypt from 'bcryptjs';
import pg from 'pg';

const PORTS = [4301, 4302];
// Both servers are given one mail catcher port: the first to start listens there, the second
// finds it taken, and its sender delivers to the first one's catcher (same host).
const SMTP_FAKE_PORT = PORTS[0] + 1000;
const MAILS = 12;
// Both servers sit behind one address, as behind a proxy: the same ORIGIN and AUTH_SECRET.
const ORIGIN = 'http://orthogon.test';
const AUTH_SECRET = 'two-server-test-secret-not-for-production-0123456789';
const DATABASE = 'orthogon_two_servers';
const START_TIMEOUT_MS = 60_000;
const REQUEST_TIMEOUT_MS = 15_000;
const PERSON = { email: 'two-servers@example.com', password: 'two-servers-password' };

/** Runs every check; returns `{ passed, failed }`. Never throws: a broken setup is a failure. */
export async function runTwoServerTest(postgresUrl, log = console.log) {
	const results = { passed: 0, failed: 0 };
	const check = (name, ok, detail = '') => {
		results[ok ? 'passed' : 'failed'] += 1;
		log(`  ${ok ? '✓' : '✗'} ${name}${ok || !detail ? '' : ` — ${detail}`}`);
	};
	const databaseUrl = postgresUrl.replace(/\/[^/]+$/, `/${DATABASE}`);
	const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'orthogon-two-servers-'));
	let servers = [];
	try {
		await recreateDatabase(postgresUrl);
		servers = PORTS.map((port) => startServer(port, databaseUrl, dataDir));
		const up = await Promise.all(servers.map(waitUntilServing));
		check('both servers start at once on one empty database and migrate it', up.every(Boolean));
		if (!up.every(Boolean)) {
			return results;
		}
		await addPerson(databaseUrl);
		await checkSessions(check);
		await checkSignInLimits(check);
		await checkMail(check, databaseUrl);
	} catch (caught) {
		check(
			'the two-server test ran to the end',
			false,
			caught instanceof Error ? caught.message : String(caught)
		);
	} finally {
		await Promise.all(servers.map(stopServer));
		if (results.failed) {
			for (const s of servers) {
				log(`--- server on ${s.port} said:\n${s.output.join('')}`);
			}
		}
		await dropDatabase(postgresUrl).catch(() => {});
		fs.rmSync(dataDir, { recursive: true, force: true });
	}
	return results;
}

const [A, B] = PORTS.map((port) => `http://127.0.0.1:${port}`);

async function checkSessions(check) {
	const signedIn = await signIn(A, PERSON.password);
	const cookie = sessionCookie(signedIn);
	check(
		'signing in on server A sets a session cookie',
		signedIn.status === 302 && cookie !== null,
		`status ${signedIn.status}`
	);
	if (!cookie) {
		return;
	}
	check('the cookie is not Secure, as ORIGIN is http', !/;\s*secure/i.test(cookie.raw), cookie.raw);

	const onB = await get(B, '/api/projects', { cookie: cookie.pair });
	check(
		'server B accepts the session made on server A',
		onB.status === 200,
		`status ${onB.status}`
	);

	// A proxy may add x-forwarded-proto; the cookie policy still follows ORIGIN alone.
	const refreshed = await get(B, '/api/projects', {
		cookie: cookie.pair,
		'x-forwarded-proto': 'https'
	});
	const again = sessionCookie(refreshed);
	check(
		'the refreshed cookie has the same name and flags as at sign-in',
		refreshed.status === 200 && again?.name === cookie.name && !/;\s*secure/i.test(again.raw),
		again ? again.raw : `status ${refreshed.status}, no session cookie`
	);

	const signedOut = await post(A, '/signout', new URLSearchParams({ redirectTo: '/signin' }), {
		cookie: cookie.pair
	});
	check('signing out on server A succeeds', signedOut.status < 400, `status ${signedOut.status}`);
	const afterOnB = await get(B, '/api/projects', { cookie: cookie.pair });
	check(
		'server B refuses the old cookie after the sign-out on A',
		afterOnB.status === 401,
		`status ${afterOnB.status}`
	);
}

async function checkSignInLimits(check) {
	const statuses = [];
	for (let i = 0; i < 5; i++) {
		statuses.push((await signIn(A, 'wrong-password')).status);
	}
	check(
		'five wrong passwords on server A are answered, not refused',
		statuses.every((s) => s === 302),
		statuses.join(',')
	);
	const sixth = await signIn(B, 'wrong-password');
	check(
		'server B refuses the sixth with 429 and retry-after: the count is shared',
		sixth.status === 429 && Number(sixth.headers.get('retry-after')) > 0,
		`status ${sixth.status}`
	);
	const right = await signIn(B, PERSON.password);
	check(
		'server B refuses even the right password from that address meanwhile',
		right.status === 429,
		`status ${right.status}`
	);
}

/**
 * Mail queued on the shared database is delivered by both servers' senders between them, each
 * message exactly once, to the one catcher that got the port.
 */
async function checkMail(check, databaseUrl) {
	const ids = await withClient(databaseUrl, async (client) => {
		const team = randomUUID();
		await client.query(
			'INSERT INTO teams (id, name, "createdAt", "updatedAt") VALUES ($1, $2, now(), now())',
			[team, 'Two-server mail']
		);
		const made = [];
		for (let i = 0; i < MAILS; i++) {
			const id = randomUUID();
			made.push(id);
			await client.query(
				`INSERT INTO outbox_messages (id, "teamId", "to", subject, text, status, attempts, "nextAttemptAt", "createdAt", "updatedAt")
				 VALUES ($1, $2, $3, $4, 'Sent by whichever server claims it.', 'queued', 0, now(), now(), now())`,
				[id, team, `reader${i}@lab.example`, `Two-server mail ${i}`]
			);
		}
		return made;
	});
	const deadline = Date.now() + 30_000;
	let sent = 0;
	while (Date.now() < deadline) {
		sent = await withClient(databaseUrl, async (client) => {
			const { rows } = await client.query(
				`SELECT count(*)::int AS n FROM outbox_messages WHERE id = ANY($1) AND status = 'sent'`,
				[ids]
			);
			return rows[0].n;
		});
		if (sent === MAILS) {
			break;
		}
		await new Promise((r) => setTimeout(r, 250));
	}
	check(
		`the two servers' senders deliver all ${MAILS} queued mails`,
		sent === MAILS,
		`${sent} sent`
	);
	const received = await withClient(databaseUrl, async (client) => {
		const { rows } = await client.query(
			`SELECT "messageId", count(*)::int AS n FROM received_mails WHERE "messageId" = ANY($1) GROUP BY "messageId"`,
			[ids.map((id) => `<${id}@orthogon>`)]
		);
		return rows;
	});
	check(
		'the one catcher received each of them exactly once',
		received.length === MAILS && received.every((r) => r.n === 1),
		JSON.stringify(received)
	);
}

function signIn(base, password) {
	return post(
		base,
		'/auth/callback/credentials',
		new URLSearchParams({ email: PERSON.email, password })
	);
}

function post(base, pathname, body, headers = {}) {
	return fetch(base + pathname, {
		method: 'POST',
		body,
		headers: { origin: ORIGIN, accept: 'text/html', ...headers },
		redirect: 'manual',
		signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS)
	});
}

function get(base, pathname, headers = {}) {
	return fetch(base + pathname, {
		headers,
		redirect: 'manual',
		signal: AbortSignal.timeout(REQUEST_TIMEOUT_MS)
	});
}

/** The Auth.js session cookie a response sets (ignoring deletions), or null. */
function sessionCookie(response) {
	for (const raw of response.headers.getSetCookie()) {
		const [pair] = raw.split(';');
		const [name, value] = pair.split('=');
		if (/authjs\.session-token$/.test(name) && value) {
			return { name, pair, raw };
		}
	}
	return null;
}

function startServer(port, databaseUrl, dataDir) {
	const env = {
		...process.env,
		PORT: String(port),
		ORIGIN,
		AUTH_SECRET,
		DATABASE_URL: databaseUrl,
		ORTHOGON_DATA_DIR: dataDir,
		ORTHOGON_DEMO: '0',
		SMTP_FAKE_PORT: String(SMTP_FAKE_PORT),
		SMTP_URL: ''
	};
	const child = spawn(process.execPath, ['build/index.js'], {
		env,
		stdio: ['ignore', 'pipe', 'pipe']
	});
	const output = [];
	child.stdout.on('data', (d) => output.push(String(d)));
	child.stderr.on('data', (d) => output.push(String(d)));
	return { port, child, output };
}

async function waitUntilServing(server) {
	const deadline = Date.now() + START_TIMEOUT_MS;
	while (Date.now() < deadline && server.child.exitCode === null) {
		try {
			const response = await fetch(`http://127.0.0.1:${server.port}/signin`, {
				signal: AbortSignal.timeout(2000)
			});
			if (response.ok) {
				return true;
			}
		} catch {
			// not listening yet
		}
		await new Promise((r) => setTimeout(r, 250));
	}
	return false;
}

function stopServer(server) {
	if (server.child.exitCode !== null) {
		return Promise.resolve();
	}
	return new Promise((resolve) => {
		const force = setTimeout(() => server.child.kill('SIGKILL'), 5000);
		server.child.once('exit', () => {
			clearTimeout(force);
			resolve();
		});
		server.child.kill('SIGTERM');
	});
}

async function withClient(url, work) {
	const client = new pg.Client({ connectionString: url });
	await client.connect();
	try {
		return await work(client);
	} finally {
		await client.end();
	}
}

async function recreateDatabase(url) {
	await withClient(url, async (client) => {
		await client.query(`DROP DATABASE IF EXISTS ${DATABASE}`);
		await client.query(`CREATE DATABASE ${DATABASE}`);
	});
}

function dropDatabase(url) {
	return withClient(url, (client) =>
		client.query(`DROP DATABASE IF EXISTS ${DATABASE} WITH (FORCE)`)
	);
}

async function addPerson(databaseUrl) {
	const hash = await bcrypt.hash(PERSON.password, 10);
	await withClient(databaseUrl, (client) =>
		client.query(
			'INSERT INTO users (id, email, name, "passwordHash", "createdAt", "updatedAt") VALUES ($1, $2, $3, $4, now(), now())',
			[randomUUID(), PERSON.email, 'Two Servers', hash]
		)
	);
}

if (import.meta.url === `file://${process.argv[1]}`) {
	const url = process.argv[2] ?? process.env.TEST_POSTGRES_URL;
	if (!url) {
		console.log('Give a PostgreSQL URL (or set TEST_POSTGRES_URL); the two-server test needs one.');
		process.exit(2);
	}
	const { passed, failed } = await runTwoServerTest(url);
	console.log(`${passed} passed, ${failed} failed`);
	process.exit(failed ? 1 : 0);
}
