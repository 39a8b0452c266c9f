import { json } from '@sveltejs/kit';
import type { RequestHandler } from './$types';
import { apiHandler } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { loadAzeotropes } from '$lib/rules/azeotropes';
import type { AzeotropesAnswer } from '$lib/api/answers';

/** `GET /api/azeotropes` → `{ azeotropes: [rows of rules/azeotropes.json] }`. Any signed-in user. */
export const GET: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	return json({ azeotropes: loadAzeotropes() } satisfies AzeotropesAnswer);
});
