import type { Handle } from '@sveltejs/kit';
import { withHeaders } from './response-headers';

/** Requests whose body a hook read through a clone: the connection holds nothing more of them. */
const readThroughClone = new WeakSet<Request>();

/** Marks a request whose body was read in full through `request.clone()`. */
export function markBodyRead(request: Request): void {
	readThroughClone.add(request);
}

function hasBody(request: Request): boolean {
	const length = request.headers.get('content-length');
	return request.body !== null && (length === null || Number(length) > 0);
}

/**
 * An answer sent before the request body was read (a 413 on Content-Length, a 401/403 from a
 * guard) leaves the rest of the body in the connection, where Node's server would read it as the
 * next request; the client's next request on that keep-alive connection then fails. Such answers
 * say `Connection: close`, so the client opens a fresh connection. Closing rather than draining:
 * a refused body may be large, and reading it is the work the early answer meant to spare.
 */
export const closeAfterUnreadBody: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	const { request } = event;
	const unread = hasBody(request) && !request.bodyUsed && !readThroughClone.has(request);
	// A 413 raised while reading (BODY_SIZE_LIMIT) also stops mid-body.
	if (!unread && !(response.status === 413 && hasBody(request))) {
		return response;
	}
	return withHeaders(response, { connection: 'close' });
};
