import { isHttpError } from '@sveltejs/kit';
import { beforeAll, describe, expect, it } from 'vitest';
import { actions } from '../../src/routes/account/+page.server';
import { createApiToken, userForApiToken } from '../../src/lib/server/auth/api-tokens';
import { hashPassword } from '../../src/lib/server/auth/passwords';
import { endSession, startSession, userForSession } from '../../src/lib/server/auth/sessions';
import { Session, User } from '../../src/lib/server/db';
import type { SessionUser } from '../../src/lib/types';
import { freshDatabase } from '../factories';

beforeAll(freshDatabase);

let serial = 0;
async function personWithPassword(password = 'old-password-1'): Promise<SessionUser> {
	const user = await User.create({
		email: `signed-in${++serial}@lab.example`,
		name: 'Signed In',
		passwordHash: await hashPassword(password)
	});
	return { id: user.id, email: user.email, name: user.name };
}

type AccountEvent = Parameters<NonNullable<(typeof actions)['changePassword']>>[0];

/** A form post to one of the account page's actions, as the browser or a script sends it. */
function accountPost(
	action: string,
	fields: Record<string, string>,
	who: { user: SessionUser; via: 'session' | 'token'; sessionId?: string | null }
): AccountEvent {
	const url = new URL(`http://localhost/account?/${action}`);
	const body = new FormData();
	for (const [name, value] of Object.entries(fields)) {
		body.set(name, value);
	}
	return {
		url,
		request: new Request(url, { method: 'POST', body }),
		locals: { user: who.user, via: who.via, sessionId: who.sessionId ?? null },
		params: {},
		getClientAddress: () => '127.0.0.1',
		setHeaders: () => {}
	} as unknown as AccountEvent;
}

async function statusOf(run: () => unknown): Promise<number | 'ok'> {
	try {
		await run();
		return 'ok';
	} catch (caught) {
		if (isHttpError(caught)) {
			return caught.status;
		}
		throw caught;
	}
}

describe('server-side sessions', () => {
	it('a session works until it is ended, on any server reading the same database', async () => {
		const person = await personWithPassword();
		const sessionId = await startSession(person.id);
		expect(await userForSession(sessionId, person.id)).toEqual(person);
		await endSession(sessionId);
		expect(await userForSession(sessionId, person.id)).toBeNull();
	});

	it('refuses an expired session, another person’s session and a malformed id', async () => {
		const person = await personWithPassword();
		const other = await personWithPassword();
		const sessionId = await startSession(person.id);
		expect(await userForSession(sessionId, other.id)).toBeNull();
		expect(await userForSession('not-a-session', person.id)).toBeNull();
		await Session.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: sessionId } });
		expect(await userForSession(sessionId, person.id)).toBeNull();
	});
});

const change = { current: 'old-password-1', next: 'new-password-2', confirm: 'new-password-2' };

describe('changing the password', () => {
	it('signs out every other session, keeps this one, and revokes the API tokens when asked', async () => {
		const person = await personWithPassword();
		const here = await startSession(person.id);
		const elsewhere = await startSession(person.id);
		const { token } = await createApiToken(person.id, 'nightly export');

		await actions.changePassword!(
			accountPost(
				'changePassword',
				{ ...change, revokeTokens: 'on' },
				{ user: person, via: 'session', sessionId: here }
			)
		);

		expect(await userForSession(here, person.id)).toEqual(person);
		expect(await userForSession(elsewhere, person.id)).toBeNull();
		expect(await userForApiToken(token)).toBeNull();
	});

	it('keeps the API tokens working when the box is unticked', async () => {
		const person = await personWithPassword();
		const here = await startSession(person.id);
		const elsewhere = await startSession(person.id);
		const { token } = await createApiToken(person.id, 'ci');

		await actions.changePassword!(
			accountPost('changePassword', change, { user: person, via: 'session', sessionId: here })
		);

		expect(await userForSession(elsewhere, person.id)).toBeNull();
		expect(await userForApiToken(token)).toEqual(person);
	});

	it('leaves everything as it was when the current password is wrong', async () => {
		const person = await personWithPassword();
		const here = await startSession(person.id);
		const elsewhere = await startSession(person.id);
		const wrong = { ...change, current: 'not-my-password', revokeTokens: 'on' };
		await actions.changePassword!(
			accountPost('changePassword', wrong, { user: person, via: 'session', sessionId: here })
		);
		expect(await userForSession(elsewhere, person.id)).toEqual(person);
	});
});

describe('what an API token may not do on the account page', () => {
	it('cannot create tokens, revoke tokens or change the password (403)', async () => {
		const person = await personWithPassword();
		const { record } = await createApiToken(person.id, 'leaked');
		const asToken = { user: person, via: 'token' as const };
		expect(
			await statusOf(() =>
				actions.createToken!(accountPost('createToken', { label: 'another one' }, asToken))
			)
		).toBe(403);
		expect(
			await statusOf(() =>
				actions.revokeToken!(accountPost('revokeToken', { tokenId: record.id }, asToken))
			)
		).toBe(403);
		expect(
			await statusOf(() =>
				actions.changePassword!(accountPost('changePassword', { ...change }, asToken))
			)
		).toBe(403);
		const stored = await User.findByPk(person.id);
		expect(stored!.passwordHash).not.toBeNull();
		expect(
			await statusOf(() =>
				actions.createToken!(
					accountPost(
						'createToken',
						{ label: 'from the browser' },
						{ user: person, via: 'session' }
					)
				)
			)
		).toBe('ok');
	});
});
