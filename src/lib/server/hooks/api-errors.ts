import type { Handle } from '@sveltejs/kit';
import { apiError, codeForStatus } from '../api';
import { isApiPath } from '../auth/guards';

// Kit answers some API requests itself (unknown method, 404); give those the API error shape too.
export const shapeApiErrors: Handle = async ({ event, resolve }) => {
	const response = await resolve(event);
	if (!isApiPath(event.url) || response.ok || response.status < 400) {
		return response;
	}
	if (response.headers.get('content-type')?.includes('application/json')) {
		const body = await response
			.clone()
			.json()
			.catch(() => null);
		if (body && typeof body === 'object' && 'error' in body) {
			return response;
		}
	}
	const message =
		response.status === 405 ? `${event.request.method} is not allowed here.` : 'Request failed.';
	const shaped = apiError(response.status, codeForStatus(response.status), message);
	const allow = response.headers.get('allow');
	if (allow) {
		shaped.headers.set('allow', allow);
	}
	return shaped;
};
