// The one way the browser calls the JSON API: every outcome, network failures included, comes back
// as a value, so callers branch on it instead of wrapping each call in try/catch.

import { VERSION_CONFLICT, type ApiErrorBody, type VersionConflictDetails } from '$lib/api/errors';

export type ApiFailure = {
	ok: false;
	status: number;
	code: string;
	message: string;
	details?: unknown;
};
/**
 * The route changed since the version a write was sent against. Told apart here, once, so
 * callers ask `isVersionConflict` rather than reading statuses or codes themselves.
 */
export type VersionConflict = ApiFailure & {
	status: 409;
	code: typeof VERSION_CONFLICT;
	details: VersionConflictDetails;
};
export type ApiResult<T> = { ok: true; status: number; data: T } | ApiFailure;

export function isVersionConflict(result: ApiResult<unknown>): result is VersionConflict {
	return !result.ok && result.status === 409 && result.code === VERSION_CONFLICT;
}

export async function callApi<T>(
	url: string,
	init: RequestInit = {},
	fetcher: typeof fetch = fetch
): Promise<ApiResult<T>> {
	let response: Response;
	try {
		const headers = new Headers(init.headers);
		if (typeof init.body === 'string' && !headers.has('content-type')) {
			headers.set('content-type', 'application/json');
		}
		headers.set('accept', 'application/json');
		response = await fetcher(url, { ...init, headers });
	} catch {
		return {
			ok: false,
			status: 0,
			code: 'network',
			message: 'The server could not be reached. Your work is kept on this page.'
		};
	}
	const body: unknown = await response.json().catch(() => null);
	if (response.ok) {
		return { ok: true, status: response.status, data: body as T };
	}
	const error = (body as Partial<ApiErrorBody> | null)?.error;
	return {
		ok: false,
		status: response.status,
		code: error?.code ?? 'http_error',
		message: error?.message ?? `The server answered ${response.status}.`,
		details: error?.details
	};
}

export const jsonBody = (method: 'POST' | 'PUT' | 'PATCH', body: unknown): RequestInit => ({
	method,
	body: JSON.stringify(body)
});
