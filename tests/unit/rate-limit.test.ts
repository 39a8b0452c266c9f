import { describe, expect, it } from 'vitest';
import { forgetSignInFailures, takeSignInAttempt } from '../../src/lib/server/auth/rate-limit';

describe('sign-in rate limits', () => {
	it('allows five attempts per e-mail in 15 minutes, then asks to wait', async () => {
		for (let i = 0; i < 5; i++) {
			expect(await takeSignInAttempt('limit@lab.example', '10.0.0.1')).toEqual({ allowed: true });
		}
		const refused = await takeSignInAttempt('LIMIT@lab.example', '10.0.0.2');
		expect(refused.allowed).toBe(false);
		if (!refused.allowed) {
			expect(refused.retryAfterSeconds).toBeGreaterThan(800);
			expect(refused.retryAfterSeconds).toBeLessThanOrEqual(900);
		}
	});

	it('limits one address that tries many accounts', async () => {
		const results = [];
		for (let i = 0; i < 31; i++) results.push((await takeSignInAttempt(`spray${i}@lab.example`, '10.9.9.9')).allowed);
		expect(results.slice(0, 30).every(Boolean)).toBe(true);
		expect(results[30]).toBe(false);
	});

	it('forgets an e-mail’s failures after a successful sign-in', async () => {
		for (let i = 0; i < 5; i++) await takeSignInAttempt('back@lab.example', `10.1.0.${i}`);
		await forgetSignInFailures('back@lab.example');
		expect((await takeSignInAttempt('back@lab.example', '10.1.0.9')).allowed).toBe(true);
	});
});
