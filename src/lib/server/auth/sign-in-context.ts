import { AsyncLocalStorage } from 'node:async_hooks';

/**
 * What the credentials check needs from the request that Auth.js does not hand to `authorize`:
 * the client's address, and a place to say that the attempt was refused for too many failures
 * (the hook then answers 429 with `retry-after`, the sign-in page says so in words).
 */
export type SignInContext = { address: string; retryAfterSeconds: number | null };

const storage = new AsyncLocalStorage<SignInContext>();

/** Runs `work` (the rest of the request) with a fresh sign-in context for this client address. */
export function withSignInContext<T>(address: string, work: (context: SignInContext) => T): T {
	const context: SignInContext = { address, retryAfterSeconds: null };
	return storage.run(context, () => work(context));
}

export function currentSignInContext(): SignInContext | undefined {
	return storage.getStore();
}
