import { RateLimiterMemory, RateLimiterRes } from 'rate-limiter-flexible';

// Per e-mail the limit stops password guessing on one account; per address it stops one client
// spraying many accounts. Both windows are 15 minutes.
const WINDOW_SECONDS = 15 * 60;
const perEmail = new RateLimiterMemory({ keyPrefix: 'signin-email', points: 5, duration: WINDOW_SECONDS });
// A shared address (a site's outbound proxy, a test run) may need more: ORTHOGON_SIGNIN_LIMIT_PER_ADDRESS.
const perAddress = new RateLimiterMemory({
	keyPrefix: 'signin-ip',
	points: Number(process.env.ORTHOGON_SIGNIN_LIMIT_PER_ADDRESS) || 30,
	duration: WINDOW_SECONDS
});

export type SignInAllowance = { allowed: true } | { allowed: false; retryAfterSeconds: number };

/** Counts one sign-in attempt; refuses it once either limit is spent. */
export async function takeSignInAttempt(email: string, address: string): Promise<SignInAllowance> {
	try {
		await perAddress.consume(address);
		await perEmail.consume(email.trim().toLowerCase() || '(blank)');
		return { allowed: true };
	} catch (rejection) {
		if (rejection instanceof RateLimiterRes) {
			return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil(rejection.msBeforeNext / 1000)) };
		}
		throw rejection;
	}
}

/** A successful sign-in clears the e-mail's count (the address keeps its count). */
export async function forgetSignInFailures(email: string): Promise<void> {
	await perEmail.delete(email.trim().toLowerCase());
}
