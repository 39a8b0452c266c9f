import { error, isHttpError, json, type RequestEvent } from '@sveltejs/kit';
import { ZodError, type z } from 'zod';
import type { ApiErrorBody } from '../api/errors';
import { DatabaseBusy, isDatabaseBusy } from './db/write-queue';

export type { ApiErrorBody };

const CODES_BY_STATUS: Record<number, string> = {
	400: 'bad_request',
	401: 'unauthenticated',
	403: 'forbidden',
	404: 'not_found',
	405: 'method_not_allowed',
	409: 'conflict',
	413: 'too_large',
	415: 'unsupported_media_type',
	422: 'invalid',
	429: 'rate_limited',
	500: 'internal',
	503: 'unavailable'
};

export function codeForStatus(status: number): string {
	return CODES_BY_STATUS[status] ?? (status >= 500 ? 'internal' : 'bad_request');
}

export function apiError(
	status: number,
	code: string,
	message: string,
	details?: unknown
): Response {
	const body: ApiErrorBody = {
		error: { code, message, ...(details === undefined ? {} : { details }) }
	};
	return json(body, { status });
}

/**
 * An answer decided below the handler (a refused structure, a busy chemistry pool), thrown so
 * services need not know about responses; `apiHandler` sends it in the API error shape.
 */
export class ApiFailure extends Error {
	constructor(
		readonly status: number,
		readonly code: string,
		message: string,
		readonly details?: unknown,
		readonly headers: Record<string, string> = {}
	) {
		super(message);
		this.name = 'ApiFailure';
	}
}

/**
 * Wraps a `+server.ts` handler so guards' `error()` throws, invalid bodies and surprises all
 * leave as the API error shape. Unknown errors are logged here and never echoed to the client.
 */
export function apiHandler<E extends RequestEvent = RequestEvent>(
	handler: (event: E) => Promise<Response>
): (event: E) => Promise<Response> {
	return async (event) => {
		try {
			return await handler(event);
		} catch (caught) {
			if (isHttpError(caught)) {
				const { status, body } = caught;
				return apiError(status, body.code ?? codeForStatus(status), body.message, body.details);
			}
			if (caught instanceof ApiFailure) {
				const response = apiError(caught.status, caught.code, caught.message, caught.details);
				for (const [name, value] of Object.entries(caught.headers)) {
					response.headers.set(name, value);
				}
				return response;
			}
			if (caught instanceof ZodError) {
				return apiError(
					400,
					'invalid_body',
					'The request body does not have the expected fields.',
					caught.issues
				);
			}
			if (isDatabaseBusy(caught)) {
				return databaseBusy();
			}
			console.error('[api]', event.request.method, event.url.pathname, caught);
			return apiError(500, 'internal', 'Something went wrong on the server; nothing was changed.');
		}
	};
}

/** The last resort when a write could not get the lock: 503 with retry-after, never a 500. */
function databaseBusy(): Response {
	const busy = new DatabaseBusy();
	const response = apiError(503, 'database_busy', busy.message);
	response.headers.set('retry-after', String(busy.retryAfterSeconds));
	return response;
}

/** The largest JSON body an endpoint reads (structures up to 1 MB fit with room to spare). */
export const MAX_JSON_BODY_BYTES = 2 * 1024 * 1024;

function tooLarge(): never {
	error(413, {
		code: 'too_large',
		message: `The request body is over ${MAX_JSON_BODY_BYTES / 1024 / 1024} MB.`
	});
}

/**
 * Reads a JSON body and validates it: over 2 MB → 413, not JSON or the wrong shape → 400
 * (a ZodError that `apiHandler` turns into `invalid_body`).
 */
export async function readJson<S extends z.ZodType>(
	event: RequestEvent,
	schema: S
): Promise<z.output<S>> {
	const declared = Number(event.request.headers.get('content-length') ?? 0);
	if (declared > MAX_JSON_BODY_BYTES) {
		tooLarge();
	}
	let body: unknown;
	try {
		const text = await event.request.text();
		if (Buffer.byteLength(text) > MAX_JSON_BODY_BYTES) {
			tooLarge();
		}
		body = JSON.parse(text);
	} catch (caught) {
		// The server's own body limit (BODY_SIZE_LIMIT) reports itself with status 413.
		if (isHttpError(caught) || (caught as { status?: number })?.status === 413) {
			tooLarge();
		}
		throw new ZodError([
			{
				code: 'custom',
				path: [],
				message: 'The body must be JSON (Content-Type: application/json).',
				input: undefined
			}
		]);
	}
	return schema.parse(body);
}
