import type { Handle } from '@sveltejs/kit';
import { isApiPath } from '../auth/guards';
import { markBodyRead } from './early-answers';
import { mediaType } from './form-origin';

/** What a page's form action (and Auth.js's form endpoints) can read. */
const FORM_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data'];
const BODY_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'];

function plain(status: number, message: string): Response {
	return new Response(message, {
		status,
		headers: { 'content-type': 'text/plain; charset=utf-8' }
	});
}

/**
 * Kit lets `text/plain` through to form actions (it counts it as a form type for CSRF), where
 * `request.formData()` throws and the action answered 500; a malformed multipart body did the
 * same. Page posts are refused here with 415 / 400 and a sentence instead. The API reads its
 * own bodies (readJson, the import endpoint) and answers in its own shape.
 */
export const requireFormBodies: Handle = async ({ event, resolve }) => {
	const { request } = event;
	if (!BODY_METHODS.includes(request.method) || isApiPath(event.url)) {
		return resolve(event);
	}
	const type = mediaType(request);
	if (!FORM_TYPES.includes(type)) {
		return plain(
			415,
			`Forms send ${FORM_TYPES.join(' or ')}; this request sent ${type || 'no content type'}.`
		);
	}
	const problem = await request
		.clone()
		.formData()
		.then(() => {
			markBodyRead(request);
			return null;
		})
		.catch((caught: unknown) =>
			(caught as { status?: number })?.status === 413
				? plain(413, 'The form is larger than the server accepts; nothing was changed.')
				: plain(400, 'The form data could not be read; nothing was changed.')
		);
	if (problem) {
		return problem;
	}
	return resolve(event);
};
