import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { DEFAULT_DATABASE_URL } from '../../src/lib/server/db/connection';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from '../../src/lib/server/db/demo-scenario';
import { MAX_IMPORT_BYTES } from '../../src/lib/server/route-sdf';
import { MAX_JSON_BODY_BYTES } from '../../src/lib/server/api';
import { databaseFile, demoSignIn, resolveEnvironment } from '../../scripts/environment.js';

// The plain-JS scripts (run by node, not by Vite) cannot import the app's TypeScript constants,
// so this test holds what they repeat to the app's own values.

describe('scripts/environment.js agrees with the app', () => {
	it('puts the database where the server looks by default', () => {
		expect(`sqlite:${path.relative(process.cwd(), databaseFile(path.resolve('data')))}`).toBe(
			DEFAULT_DATABASE_URL
		);
	});

	it('signs in as the demo person the seed creates, with the seed password', () => {
		const chemist = DEMO_SIGN_INS.find((p) => p.role === 'chemist')!;
		expect(demoSignIn('chemist')).toEqual({ email: chemist.email, password: DEMO_PASSWORD });
		expect(() => demoSignIn('no-such-role')).toThrow(/no no-such-role/);
	});

	it('lets through the largest body the API and the route import take', () => {
		const limit = resolveEnvironment({ AUTH_SECRET: 'set', PORT: '1' }).BODY_SIZE_LIMIT;
		const megabytes = Number(/^(\d+)M$/.exec(limit)?.[1]);
		expect(megabytes * 1024 * 1024).toBeGreaterThan(
			Math.max(MAX_IMPORT_BYTES, MAX_JSON_BODY_BYTES)
		);
	});
});
