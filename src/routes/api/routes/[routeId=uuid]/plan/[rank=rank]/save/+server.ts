import { error, json } from '@sveltejs/kit';
import { z } from 'zod';
import type { RequestHandler } from './$types';
import type { SavedPlanAnswer } from '$lib/api/answers';
import { VERSION_CONFLICT, type VersionConflictDetails } from '$lib/api/errors';
import { apiError, apiHandler, readJson } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeDocumentOr422 } from '$lib/server/route-api';
import { approvedSavedConditions } from '$lib/server/services/planning-library';
import {
	createRoute,
	plannedRouteName,
	routeDocumentAt,
	VersionConflict
} from '$lib/server/services/routes';
import { teamRuleLayer } from '$lib/server/services/team-rules-layer';

function noSuchPlan(rank: string, why: string): never {
	error(404, { code: 'no_such_plan', message: `There is no plan ${rank} for this route. ${why}` });
}

const body = z.object({ version: z.number().int().positive() });

/**
 * `POST /api/routes/{id}/plan/{rank}/save` `{ version }` → `201 { id, version, name }`: plans the
 * stored route again and saves plan `rank` as a new route in the same project, linked to this one.
 * The document is the server's own plan, never one a client sends; `version` is the route version
 * the plans were shown for, so a route changed since then answers 409 instead of saving a plan
 * the chemist never saw.
 */
export const POST: RequestHandler = apiHandler(async (event) => {
	const { route, user, project } = await requireRouteAction(
		event,
		event.params.routeId,
		'route.edit'
	);
	// The `rank` matcher has already answered 404 for anything that cannot name a plan.
	const rank = Number(event.params.rank);
	const { version } = await readJson(event, body);
	let stored;
	try {
		stored = await routeDocumentAt(route, version);
	} catch (caught) {
		if (!(caught instanceof VersionConflict)) {
			throw caught;
		}
		const details: VersionConflictDetails = { currentVersion: caught.currentVersion };
		return apiError(
			409,
			VERSION_CONFLICT,
			`The route has changed since these plans were made (now at version ${caught.currentVersion}). Plan again.`,
			details
		);
	}
	// The same plans as `POST /api/routes/{id}/plan` showed: the team's overrides and its saved
	// conditions.
	const [layer, savedConditions] = await Promise.all([
		teamRuleLayer(project.teamId),
		approvedSavedConditions(project.teamId)
	]);
	const answer = await runChemistry('plan', {
		document: routeDocumentOr422(stored),
		layer,
		savedConditions
	});
	const plan = answer.plans.find((p) => p.rank === rank);
	if (!plan) {
		const why =
			answer.unsolved?.map((u) => u.reason).join(' ') ??
			`The planner found ${answer.plans.length} plan(s).`;
		noSuchPlan(event.params.rank, why);
	}
	const document = routeDocumentOr422({
		...plan.route,
		name: plannedRouteName(route.name, plan.rank)
	});
	const created = await createRoute(user, project, document, { from: route, rank: plan.rank });
	const saved: SavedPlanAnswer = { id: created.id, version: created.version, name: created.name };
	return json(saved, { status: 201 });
});
