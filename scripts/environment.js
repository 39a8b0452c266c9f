// Settings shared by `npm start`, the command-line tools and the e2e server: one place decides
// where the data folder, database and auth secret live.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

export function dataDir(env = process.env) {
	return path.resolve(env.ORTHOGON_DATA_DIR || 'data');
}

/** The SQLite file in a data folder, e.g. `data/orthogon.db` (as DEFAULT_DATABASE_URL in src/lib/server/db/connection.ts). */
export const databaseFile = (dir) => path.join(dir, 'orthogon.db');

/** The invented demo scenario the server seeds: src/lib/server/db/demo-scenario.json, its one source. */
export function demoScenario() {
	const file = new URL('../src/lib/server/db/demo-scenario.json', import.meta.url);
	return JSON.parse(fs.readFileSync(file, 'utf8'));
}

/** The first demo person with `role` and the demo password, e.g. `demoSignIn('chemist')`. */
export function demoSignIn(role) {
	const scenario = demoScenario();
	const person = scenario.teams.flatMap((t) => t.people).find((p) => p.role === role);
	if (!person) {
		throw new Error(`The demo scenario has no ${role}.`);
	}
	return { email: person.email, password: scenario.password };
}

/** Reads a `.env` file in the working folder, if there is one, without overriding the shell. */
export function loadDotEnv() {
	if (fs.existsSync('.env')) {
		process.loadEnvFile('.env');
	}
}

/** Fills in DATABASE_URL, AUTH_SECRET, PORT and ORIGIN where they are not set. */
export function resolveEnvironment(env = process.env) {
	const dir = dataDir(env);
	const port = env.PORT || '3000';
	const resolved = {
		...env,
		PORT: port,
		ORIGIN: env.ORIGIN || `http://localhost:${port}`,
		DATABASE_URL: env.DATABASE_URL || `sqlite:${databaseFile(dir)}`,
		// JSON bodies over 2 MB get 413 from the API (src/lib/server/api.ts); route imports take files up to 5 MB.
		BODY_SIZE_LIMIT: env.BODY_SIZE_LIMIT || '6M'
	};
	if (!resolved.AUTH_SECRET) {
		resolved.AUTH_SECRET = persistentSecret(dir);
	}
	return resolved;
}

/** A secret generated once into the data folder, so sessions survive restarts. */
function persistentSecret(dir) {
	const file = path.join(dir, 'auth-secret');
	if (fs.existsSync(file)) {
		return fs.readFileSync(file, 'utf8').trim();
	}
	fs.mkdirSync(dir, { recursive: true });
	const secret = randomBytes(32).toString('base64url');
	fs.writeFileSync(file, secret + '\n', { mode: 0o600 });
	return secret;
}
