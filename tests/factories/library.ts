import type { RequestEvent } from '@sveltejs/kit';
import { POST as importLibrary } from '../../src/routes/api/library/import/+server';
import { GET as exportLibrary } from '../../src/routes/api/library/export/+server';
import { createSavedCondition } from '../../src/lib/server/services/library-writes';
import type { NewSavedConditionBody } from '../../src/lib/library/contract';
import type { SessionUser } from '../../src/lib/types';
import { fakeEvent } from '.';

/** A saved condition as the API would store it, e.g. `addEntry(chemist, teamId, { reagents: 'TBAF' })`. */
export async function addEntry(
	author: SessionUser,
	teamId: string,
	fields: Partial<NewSavedConditionBody> = {}
) {
	return createSavedCondition(author, {
		teamId,
		protectingGroup: 'TBS',
		kind: 'install',
		reagents: 'TBSCl, imidazole, DMF',
		solvent: null,
		temperature: null,
		time: null,
		scale: null,
		yield: null,
		reference: null,
		notes: null,
		...fields
	});
}

/** Posts a CSV to `POST /api/library/import` as `user` (multipart `file` and `teamId`). */
export async function uploadLibraryCsv(
	user: SessionUser | null,
	teamId: string,
	text: string | null,
	name = 'library.csv'
) {
	const form = new FormData();
	if (text !== null) {
		form.set('file', new File([text], name, { type: 'text/csv' }));
	}
	form.set('teamId', teamId);
	const request = new Request('http://localhost/api/library/import', {
		method: 'POST',
		body: form
	});
	const event = {
		url: new URL(request.url),
		request,
		locals: { user, via: user ? 'session' : null },
		params: {}
	};
	const response = await (importLibrary as unknown as (e: unknown) => Promise<Response>)(event);
	return { status: response.status, body: await response.json() };
}

/** `GET /api/library/export?teamId` as `user`: status, headers and the CSV text. */
export async function downloadLibraryCsv(user: SessionUser, teamId: string) {
	const event = fakeEvent({ user, path: `/api/library/export?teamId=${teamId}` });
	const response = await (exportLibrary as unknown as (e: RequestEvent) => Promise<Response>)(
		event
	);
	return { status: response.status, headers: response.headers, text: await response.text() };
}
