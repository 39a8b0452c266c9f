import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { apiHandler, readJson } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeDocumentOr422 } from '$lib/server/route-api';

/** `POST /api/plan` with a route document → `{ plans: [...], unsolved? }`. */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const document = routeDocumentOr422(await readJson(event, z.unknown()));
	return json(await runChemistry('plan', { document }));
});
