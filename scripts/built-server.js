// Starts the built server (build/index.js) the way `npm start` does, on loopback, with its own data
// folder: shared by the load test, the crash test and anything else that needs a real server.
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import { databaseFile, demoScenario, resolveEnvironment } from './environment.js';

/** A TCP port nobody listens on right now, chosen by the OS. */
export function freePort() {
	return new Promise((resolve, reject) => {
		const probe = net.createServer();
		probe.unref();
		probe.on('error', reject);
		probe.listen(0, '127.0.0.1', () => {
			const { port } = probe.address();
			probe.close(() => resolve(port));
		});
	});
}

/**
 * `node build` on 127.0.0.1:`port` with the data folder `dataDir` (created; the demo seed runs
 * at start). Resolves once /signin answers; rejects if the server exits first or 60 s pass.
 */
export async function startBuiltServer({ dataDir, port, env = {}, quiet = true }) {
	if (!fs.existsSync('build/index.js')) {
		throw new Error('No build/: run `node scripts/start.js --build-only` first.');
	}
	fs.mkdirSync(dataDir, { recursive: true });
	const origin = `http://127.0.0.1:${port}`;
	const resolved = resolveEnvironment({
		...process.env,
		ORTHOGON_DATA_DIR: dataDir,
		DATABASE_URL: `sqlite:${databaseFile(dataDir)}`,
		HOST: '127.0.0.1',
		PORT: String(port),
		ORIGIN: origin,
		// The server's local mail catcher gets a free port of its own, never a dev server's 2525.
		SMTP_FAKE_PORT: String(await freePort()),
		...env
	});
	const child = spawn(process.execPath, ['build/index.js'], {
		env: resolved,
		stdio: ['ignore', quiet ? 'ignore' : 'inherit', 'pipe']
	});
	let stderr = '';
	child.stderr.on('data', (chunk) => {
		stderr = (stderr + chunk).slice(-4000);
		if (!quiet) {
			process.stderr.write(chunk);
		}
	});
	const exited = new Promise((resolve) =>
		child.once('exit', (code, signal) => resolve({ code, signal }))
	);
	const deadline = Date.now() + 60_000;
	let gone = false;
	void exited.then(() => (gone = true));
	while (!gone) {
		try {
			if ((await fetch(`${origin}/signin`)).ok) {
				break;
			}
		} catch {
			// not listening yet
		}
		if (Date.now() > deadline) {
			child.kill('SIGKILL');
			throw new Error(`The built server did not answer within 60 s.\n${stderr}`);
		}
		await new Promise((resolve) => setTimeout(resolve, 200));
	}
	if (gone) {
		throw new Error(`The built server exited at start.\n${stderr}`);
	}
	return {
		origin,
		child,
		exited,
		stderr: () => stderr,
		async stop(signal = 'SIGTERM') {
			if (child.exitCode === null && child.signalCode === null) {
				child.kill(signal);
			}
			return exited;
		}
	};
}

/** Signs in as a demo person through the credentials callback; returns the Cookie header value. */
export async function signInCookie(origin, email, password = demoScenario().password) {
	const response = await fetch(`${origin}/auth/callback/credentials`, {
		method: 'POST',
		redirect: 'manual',
		headers: { origin, 'content-type': 'application/x-www-form-urlencoded' },
		body: new URLSearchParams({ email, password })
	});
	const cookies = response.headers.getSetCookie().map((c) => c.split(';')[0]);
	const session = cookies.find((c) => /session-token=/.test(c));
	if (!session) {
		throw new Error(`Sign-in as ${email} failed (status ${response.status}).`);
	}
	return cookies.join('; ');
}
