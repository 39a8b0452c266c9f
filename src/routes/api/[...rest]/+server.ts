import type { RequestHandler } from './$types';
import { apiError } from '$lib/server/api';

/** Any `/api` path without a handler answers in the API error shape, not with an HTML page. */
export const fallback: RequestHandler = ({ url }) =>
	apiError(404, 'not_found', `There is no API endpoint at ${url.pathname}.`);
