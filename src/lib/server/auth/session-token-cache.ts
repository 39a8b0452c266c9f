import {
	decode,
	encode,
	type JWT,
	type JWTDecodeParams,
	type JWTEncodeParams
} from '@auth/core/jwt';
import { LRUCache } from 'lru-cache';
import { createHash } from 'node:crypto';

// Auth.js reads and re-issues the session JWT on every request: two key derivations, a decryption
// and an encryption, about a fifth of a cheap read's CPU on the request thread. Both are pure
// work: one token string always decodes to the same payload, and a token issued minutes ago can
// be handed out again instead of a new one. What ends a session is its row (sessions.ts), read on
// every request, so neither cache can keep a signed-out session alive. Per process, and derived:
// another server works the same answer out for itself.

/** A token is re-issued (new expiry) once it is this old; younger ones are returned as they are. */
export const REISSUE_AFTER_SECONDS = 10 * 60;
const CACHE_BYTES = 8 * 2 ** 20;

const decoded = new LRUCache<string, JWT>({
	maxSize: CACHE_BYTES,
	sizeCalculation: (payload, key) => key.length + JSON.stringify(payload).length
});
/** The token string issued for a payload, by its `jti`. */
const issued = new LRUCache<string, { token: string; claims: string }>({
	maxSize: CACHE_BYTES,
	sizeCalculation: (entry, key) => key.length + entry.token.length + entry.claims.length
});

const nowSeconds = () => Math.floor(Date.now() / 1000);

/** Entries are told apart by salt and secret too: a token is only good for the key it was made with. */
function cacheKey(secret: string | string[], salt: string, part: string): string {
	const keyId = createHash('sha256')
		.update(JSON.stringify([secret, salt]))
		.digest('base64url');
	return `${keyId}\n${part}`;
}

/** The claims a session carries, without the times and id each issue gives it. */
function claimsOf(token: JWT): string {
	const { iat: _iat, exp: _exp, jti: _jti, ...claims } = token;
	return JSON.stringify(claims);
}

/** Auth.js's `decode`, remembered per token string until the token expires. */
export async function decodeSessionToken(params: JWTDecodeParams): Promise<JWT | null> {
	if (!params.token) {
		return null;
	}
	const key = cacheKey(params.secret, params.salt, params.token);
	const hit = decoded.get(key);
	if (hit && typeof hit.exp === 'number' && hit.exp > nowSeconds()) {
		return { ...hit };
	}
	const payload = await decode(params);
	if (payload) {
		decoded.set(key, payload);
	}
	return payload;
}

/**
 * Auth.js's `encode`, except that a token re-issued for the same claims within
 * REISSUE_AFTER_SECONDS of its first issue is the same string as before.
 */
export async function encodeSessionToken(params: JWTEncodeParams): Promise<string> {
	const { token, salt } = params;
	if (
		token?.jti &&
		typeof token.iat === 'number' &&
		nowSeconds() - token.iat < REISSUE_AFTER_SECONDS
	) {
		const again = issued.get(cacheKey(params.secret, salt, token.jti));
		if (again && again.claims === claimsOf(token)) {
			return again.token;
		}
	}
	const fresh = await encode(params);
	const payload = await decodeSessionToken({ token: fresh, secret: params.secret, salt });
	if (payload?.jti) {
		issued.set(cacheKey(params.secret, salt, payload.jti), {
			token: fresh,
			claims: claimsOf(payload)
		});
	}
	return fresh;
}
