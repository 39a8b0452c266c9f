import { beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '../../src/lib/server/auth/passwords';
import {
	settleSignInAttempt,
	SIGN_IN_LIMITS,
	takeSignInAttempt
} from '../../src/lib/server/auth/rate-limit';
import { authorizeSignIn } from '../../src/lib/server/auth/sign-in';
import { withSignInContext } from '../../src/lib/server/auth/sign-in-context';
import { User } from '../../src/lib/server/db';
import { freshDatabase } from '../factories';

beforeAll(freshDatabase);

/** One attempt that checks the password and finds it wrong. */
async function fail(email: string, address: string) {
	const allowance = await takeSignInAttempt(email, address);
	if (allowance.allowed) {
		await settleSignInAttempt(email, address, false);
	}
	return allowance;
}

/** One attempt with the right password. */
async function succeed(email: string, address: string) {
	const allowance = await takeSignInAttempt(email, address);
	if (allowance.allowed) {
		await settleSignInAttempt(email, address, true);
	}
	return allowance;
}

describe('sign-in limits', () => {
	it('allows five failures for one e-mail from one address in 15 minutes, then asks to wait', async () => {
		for (let i = 0; i < 5; i++) {
			expect(await fail('limit@lab.example', '10.0.0.1')).toEqual({ allowed: true });
		}
		const refused = await takeSignInAttempt('LIMIT@lab.example', '10.0.0.1');
		expect(refused.allowed).toBe(false);
		if (!refused.allowed) {
			expect(refused.retryAfterSeconds).toBeGreaterThan(800);
			expect(refused.retryAfterSeconds).toBeLessThanOrEqual(900);
		}
	});

	it('does not let a stranger’s failures from another address lock the owner out', async () => {
		for (let i = 0; i < 12; i++) {
			await fail('owner@lab.example', '203.0.113.66');
		}
		expect((await takeSignInAttempt('owner@lab.example', '203.0.113.66')).allowed).toBe(false);
		expect(await succeed('owner@lab.example', '10.0.0.7')).toEqual({ allowed: true });
	});

	it('limits one address that tries many accounts', async () => {
		const results = [];
		for (let i = 0; i <= SIGN_IN_LIMITS.perAddress; i++) {
			results.push((await fail(`spray${i}@lab.example`, '10.9.9.9')).allowed);
		}
		expect(results.slice(0, SIGN_IN_LIMITS.perAddress).every(Boolean)).toBe(true);
		expect(results[SIGN_IN_LIMITS.perAddress]).toBe(false);
	});

	it('does not count successful sign-ins, for the account or the address', async () => {
		for (let i = 0; i < SIGN_IN_LIMITS.perAddress + 5; i++) {
			expect(await succeed('scripted@lab.example', '10.5.5.5')).toEqual({ allowed: true });
		}
		for (let i = 0; i < 5; i++) {
			expect((await fail('scripted@lab.example', '10.5.5.5')).allowed).toBe(true);
		}
	});

	it('forgets an account’s failures after a successful sign-in', async () => {
		for (let i = 0; i < 4; i++) {
			await fail('back@lab.example', '10.1.0.1');
		}
		await succeed('back@lab.example', '10.1.0.1');
		for (let i = 0; i < 5; i++) {
			expect((await fail('back@lab.example', '10.1.0.1')).allowed).toBe(true);
		}
	});

	it('lets no more than five parallel guesses through', async () => {
		const attempts = await Promise.all(
			Array.from({ length: 20 }, () => takeSignInAttempt('parallel@lab.example', '10.3.3.3'))
		);
		expect(attempts.filter((a) => a.allowed)).toHaveLength(SIGN_IN_LIMITS.perAccountFromAddress);
	});
});

describe('authorizeSignIn (what Auth.js runs for every credentials sign-in)', () => {
	it('counts wrong passwords, then refuses even the right one from that address and says for how long', async () => {
		await User.create({
			email: 'chemist@lab.example',
			name: 'Chemist',
			passwordHash: await hashPassword('right-password')
		});
		const attempt = (password: string, address: string) =>
			withSignInContext(address, async (context) => ({
				user: await authorizeSignIn('chemist@lab.example', password),
				retryAfterSeconds: context.retryAfterSeconds
			}));

		for (let i = 0; i < 5; i++) {
			expect(await attempt('wrong', '198.51.100.9')).toEqual({
				user: null,
				retryAfterSeconds: null
			});
		}
		const refused = await attempt('right-password', '198.51.100.9');
		expect(refused.user).toBeNull();
		expect(refused.retryAfterSeconds).toBeGreaterThan(0);

		const fromHome = await attempt('right-password', '10.0.0.2');
		expect(fromHome.user?.email).toBe('chemist@lab.example');
	});
});
