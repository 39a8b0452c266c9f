import { afterEach, describe, expect, it, vi } from 'vitest';
import {
	decodeSessionToken,
	encodeSessionToken,
	REISSUE_AFTER_SECONDS
} from '../../src/lib/server/auth/session-token-cache';

// The session cookie's JWT is read and re-issued on every request; these caches must save that
// work without changing what a token means (issue 10: cheap reads stay fast under load).
const secret = 'a-test-secret-of-at-least-thirty-two-characters';
const salt = 'authjs.session-token';
const maxAge = 12 * 60 * 60;
const claims = { uid: 'user-1', sid: 'session-1' };

afterEach(() => vi.useRealTimers());

describe('session token cache', () => {
	it('decodes what it issued, and hands out the same string while the token is young', async () => {
		const first = await encodeSessionToken({ token: claims, secret, salt, maxAge });
		const payload = await decodeSessionToken({ token: first, secret, salt });
		expect(payload).toMatchObject(claims);
		const again = await encodeSessionToken({ token: payload!, secret, salt, maxAge });
		expect(again).toBe(first);
	});

	it('issues a new token (a new expiry) once the old one is older than the re-issue age', async () => {
		vi.useFakeTimers({ toFake: ['Date'] });
		const first = await encodeSessionToken({ token: claims, secret, salt, maxAge });
		const payload = await decodeSessionToken({ token: first, secret, salt });
		vi.setSystemTime(Date.now() + (REISSUE_AFTER_SECONDS + 1) * 1000);
		const renewed = await encodeSessionToken({ token: payload!, secret, salt, maxAge });
		expect(renewed).not.toBe(first);
		const renewedPayload = await decodeSessionToken({ token: renewed, secret, salt });
		expect(renewedPayload!.exp!).toBeGreaterThan(payload!.exp!);
	});

	it('never reuses a token for other claims', async () => {
		const first = await encodeSessionToken({ token: claims, secret, salt, maxAge });
		const payload = await decodeSessionToken({ token: first, secret, salt });
		const other = await encodeSessionToken({
			token: { ...payload!, sid: 'session-2' },
			secret,
			salt,
			maxAge
		});
		expect(other).not.toBe(first);
		expect(await decodeSessionToken({ token: other, secret, salt })).toMatchObject({
			sid: 'session-2'
		});
	});

	it('refuses a tampered token and a token signed with another secret', async () => {
		const token = await encodeSessionToken({ token: claims, secret, salt, maxAge });
		const tampered = token.slice(0, -4) + (token.endsWith('AAAA') ? 'BBBB' : 'AAAA');
		await expect(decodeSessionToken({ token: tampered, secret, salt })).rejects.toThrow();
		await expect(
			decodeSessionToken({ token, secret: 'another-secret-of-at-least-thirty-two-chars', salt })
		).rejects.toThrow();
	});

	it('refuses an expired token even after it was read (and cached) while valid', async () => {
		vi.useFakeTimers({ toFake: ['Date'] });
		const token = await encodeSessionToken({ token: claims, secret, salt, maxAge: 60 });
		expect(await decodeSessionToken({ token, secret, salt })).toMatchObject(claims);
		vi.setSystemTime(Date.now() + 10 * 60 * 1000);
		await expect(decodeSessionToken({ token, secret, salt })).rejects.toThrow();
	});
});
