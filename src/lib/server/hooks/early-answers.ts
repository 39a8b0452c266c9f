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

/** A refused body up to this size is read to its end before the answer goes out (see below). */
const DRAIN_LIMIT_BYTES = 64 * 1024;

/**
 * Reads what is left of a small body, e.g. a 2 kB upload refused with 403. True when it all
 * arrived within DRAIN_LIMIT_BYTES; false for a larger or failing body (the connection closes).
 */
async function drainSmallBody(request: Request): Promise<boolean> {
	const length = request.headers.get('content-length');
	if (!request.body || (length !== null && Number(length) > DRAIN_LIMIT_BYTES)) {
		return false;
	}
	const reader = request.body.getReader();
	let total = 0;
	try {
		for (;;) {
			const { done, value } = await reader.read();
			if (done) {
				return true;
			}
			total += value.byteLength;
			if (total > DRAIN_LIMIT_BYTES) {
				void reader.cancel().catch(() => {});
				return false;
			}
		}
	} catch {
		return false;
	}
}

/**
 * An answer sent before the request body was read (a 413 on Content-Length, a 401/403 from a
 * guard) leaves the rest of the body in the connection, where Node's server would read it as the
 * next request; the client's next request on that keep-alive connection then fails. A small body
 * is read to its end first: closing the connection while the client is still sending it makes
 * the client fail with EPIPE instead of reading the answer (a refused 1 kB multipart upload did).
 * A large body (or any 413) is not read, since reading it is the work the early answer meant to
 * spare: those answers say `Connection: close`, so the client opens a fresh connection.
 */
export const closeAfterUnreadBody: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	const { request } = event;
	const unread = hasBody(request) && !request.bodyUsed && !readThroughClone.has(request);
	// A 413 raised while reading (BODY_SIZE_LIMIT) also stops mid-body.
	if (!unread && !(response.status === 413 && hasBody(request))) {
		return response;
	}
	if (unread && response.status !== 413 && (await drainSmallBody(request))) {
		return response;
	}
	return withHeaders(response, { connection: 'close' });
};
