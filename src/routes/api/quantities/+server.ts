import { json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import { ApiFailure, apiHandler, readJson } from '$lib/server/api';
import { requireUser } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { quantitiesRequest, type QuantitiesAnswer } from '$lib/quantities/contract';
import { describeIssues } from '$lib/quantities/request-errors';

/**
 * `POST /api/quantities` `{ materials, waterRemoval? }` → `{ materials, limiting, waterRemoval?,
 * cautions }` (src/lib/quantities/contract.ts). Any signed-in user; stores nothing. A body of the
 * wrong shape is a 400 naming the material and field; input the engine cannot use is a 422.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	requireUser(event);
	const body = await readJson(event, z.unknown());
	const parsed = quantitiesRequest.safeParse(body);
	if (!parsed.success) {
		throw new ApiFailure(
			400,
			'invalid_body',
			describeIssues(parsed.error, body),
			parsed.error.issues
		);
	}
	// Structures are read with openchemlib, so the work runs in the chemistry pool.
	const answer: QuantitiesAnswer = await runChemistry('quantities', { request: parsed.data });
	return json(answer);
});
