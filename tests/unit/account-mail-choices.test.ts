import { beforeAll, describe, expect, it } from 'vitest';
import { actions, load } from '../../src/routes/account/+page.server';
import { commentMailsOn } from '../../src/lib/server/services/mail-preferences';
import type { SessionUser } from '../../src/lib/types';
import { fakeEvent, freshDatabase, makeUser } from '../factories';

type AnyEvent = Parameters<typeof load>[0];

/** The account form as the browser posts it: an unticked checkbox sends nothing. */
function post(user: SessionUser, fields: Record<string, string>) {
	const url = new URL('http://localhost/account?/mailChoices');
	const body = new FormData();
	for (const [name, value] of Object.entries(fields)) {
		body.set(name, value);
	}
	return {
		url,
		request: new Request(url, { method: 'POST', body }),
		locals: { user, via: 'session', sessionId: null },
		params: {},
		getClientAddress: () => '127.0.0.1',
		setHeaders: () => {}
	} as unknown as Parameters<NonNullable<typeof actions.mailChoices>>[0];
}

const shownChoice = async (user: SessionUser) => {
	const data = (await load(fakeEvent({ user, path: '/account' }) as unknown as AnyEvent)) as {
		mailForm: { data: { commentMails: boolean } };
	};
	return data.mailForm.data.commentMails;
};

let person: SessionUser;
beforeAll(async () => {
	await freshDatabase();
	person = await makeUser('Mail chooser');
});

describe('"Mail me about comments" on the Account page', () => {
	it('is ticked for someone who never chose', async () => {
		expect(await shownChoice(person)).toBe(true);
	});

	it('unticked and saved turns comment mails off, and the page shows it so', async () => {
		const result = (await actions.mailChoices!(post(person, {}))) as {
			form: { message: string };
		};
		expect(result.form.message).toBe('Saved: comment mails are off.');
		expect(await commentMailsOn(person.id)).toBe(false);
		expect(await shownChoice(person)).toBe(false);
	});

	it('ticked and saved turns them on again', async () => {
		await actions.mailChoices!(post(person, { commentMails: 'on' }));
		expect(await commentMailsOn(person.id)).toBe(true);
		expect(await shownChoice(person)).toBe(true);
	});
});
