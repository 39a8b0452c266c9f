#!/usr/bin/env node
// `npm test`: formatting and lint, type checks, unit and reference tests, then tests against the
// built server (crash safety) and browser tests against the built app.
// Every stage runs even when an earlier one fails, and the last line sums up all of them.
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ensureChromium } from './ensure-chromium.js';
import { startTestPostgres } from './test-postgres.js';
import { runTwoServerTest } from './test-two-servers.js';

const REPORTS = 'test-results';
fs.mkdirSync(REPORTS, { recursive: true });
const run = (cmd, args, env = {}) =>
	spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } }).status === 0;

const failures = [];
let passed = 0;
let failed = 0;

function count(file, read) {
	try {
		const [p, f] = read(JSON.parse(fs.readFileSync(file, 'utf8')));
		passed += p;
		failed += f;
	} catch {
		// no report: the stage failed before running tests and is counted below
	}
}

// The house style, enforced: prettier's formatting and ESLint's rules (eslint.config.js). Each
// counts as one check, so a fresh clone with unformatted or lint-failing code fails `npm test`.
console.log('\n▶ Formatting (prettier --check)');
if (run('npx', ['prettier', '--check', '.', '--log-level', 'warn'])) {
	passed += 1;
} else {
	failures.push('formatting (run `npm run format`)');
	failed += 1;
}

console.log('\n▶ Lint (eslint)');
if (run('npx', ['eslint', '.', '--max-warnings', '0'])) {
	passed += 1;
} else {
	failures.push('lint');
	failed += 1;
}

console.log('\n▶ Type checks (svelte-check)');
if (
	!run('npx', ['svelte-kit', 'sync']) ||
	!run('npx', ['svelte-check', '--tsconfig', './tsconfig.json', '--fail-on-warnings'])
) {
	failures.push('type checks');
	failed += 1;
}

console.log('\n▶ Unit and reference tests (vitest)');
const postgres = process.env.TEST_POSTGRES_URL
	? { url: process.env.TEST_POSTGRES_URL }
	: startTestPostgres();
console.log(
	postgres.url
		? `PostgreSQL for the dialect test: ${postgres.url}`
		: `The PostgreSQL dialect test is skipped: ${postgres.reason}.`
);
const vitestReport = `${REPORTS}/vitest.json`;
fs.rmSync(vitestReport, { force: true });
const vitestOk = run(
	'npx',
	['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestReport}`],
	{
		...(postgres.url ? { TEST_POSTGRES_URL: postgres.url } : {})
	}
);
if (!vitestOk) {
	failures.push('unit tests');
}
count(vitestReport, (r) => [r.numPassedTests, r.numFailedTests + (r.numFailedTestSuites ?? 0)]);

console.log('\n▶ Build');
const built = run('node', ['scripts/start.js', '--build-only']);
if (!built) {
	failures.push('build');
}

// The throwaway PostgreSQL stays up until here: two built servers share it.
console.log('\n▶ Two servers on one PostgreSQL (shared sessions and sign-in limits)');
if (!postgres.url) {
	console.log(`The two-server test is skipped: ${postgres.reason}.`);
} else if (!built) {
	console.log('The two-server test is skipped: the build failed.');
} else {
	const twoServers = await runTwoServerTest(postgres.url);
	passed += twoServers.passed;
	failed += twoServers.failed;
	if (twoServers.failed) {
		failures.push('two-server test');
	}
}
postgres.stop?.();

console.log('\n▶ Built-server tests (crash safety: SIGKILL during writes)');
const serverReport = `${REPORTS}/server-tests.json`;
fs.rmSync(serverReport, { force: true });
if (
	!run('npx', [
		'vitest',
		'run',
		'-c',
		'tests/server/vitest.config.ts',
		'--reporter=default',
		'--reporter=json',
		`--outputFile.json=${serverReport}`
	])
) {
	failures.push('built-server tests');
}
count(serverReport, (r) => [r.numPassedTests, r.numFailedTests + (r.numFailedTestSuites ?? 0)]);

console.log('\n▶ Browser tests (Playwright on Debian Chromium)');
const e2eReport = path.resolve(REPORTS, 'playwright.json');
fs.rmSync(e2eReport, { force: true });
if (!ensureChromium()) {
	failures.push('browser tests (no Chromium)');
	failed += 1;
} else if (
	!run('npx', ['playwright', 'test', '-c', 'tests/e2e/playwright.config.ts'], {
		PLAYWRIGHT_JSON_OUTPUT_NAME: e2eReport
	})
) {
	failures.push('browser tests');
}
count(e2eReport, (r) => [r.stats.expected + r.stats.flaky, r.stats.unexpected]);

console.log(failures.length ? `\nFailed stages: ${failures.join(', ')}` : '\nAll stages passed.');
console.log(`${passed} passed, ${failed} failed`);
process.exit(failures.length ? 1 : 0);
