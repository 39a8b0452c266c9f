import { createHash } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import {
	createApiToken,
	listApiTokens,
	revokeApiToken,
	userForApiToken
} from '../../src/lib/server/auth/api-tokens';
import { ApiToken } from '../../src/lib/server/db';
import { freshDatabase, makeUser } from '../factories';

beforeAll(freshDatabase);

describe('API tokens', () => {
	it('stores only the SHA-256 of the token and resolves its owner', async () => {
		const owner = await makeUser('Token Owner');
		const { token, record } = await createApiToken(owner.id, 'nightly export');
		expect(token).toMatch(/^ogt_[A-Za-z0-9_-]{32}$/);
		const stored = await ApiToken.findByPk(record.id);
		expect(stored!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
		expect(JSON.stringify(stored!.toJSON())).not.toContain(token.slice(4));
		expect(await userForApiToken(token)).toEqual(owner);
		expect((await ApiToken.findByPk(record.id))!.lastUsedAt).not.toBeNull();
	});

	it('stops working once revoked, and only its owner can revoke it', async () => {
		const owner = await makeUser();
		const stranger = await makeUser();
		const { token, record } = await createApiToken(owner.id, 'ci');
		expect(await revokeApiToken(stranger.id, record.id)).toBe(false);
		expect(await userForApiToken(token)).not.toBeNull();
		expect(await revokeApiToken(owner.id, record.id)).toBe(true);
		expect(await userForApiToken(token)).toBeNull();
		expect(await listApiTokens(owner.id)).toEqual([]);
	});

	it('rejects unknown tokens', async () => {
		expect(await userForApiToken('ogt_not-a-real-token')).toBeNull();
	});
});
