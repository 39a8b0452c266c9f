import type { PageServerLoad } from './$types';
import { ROUTE_STATUS_LABELS, type RouteStatus } from '$lib/review/contract';
import { requireRouteAction } from '$lib/server/auth/guards';
import { routeDocument } from '$lib/server/services/routes';
import { reviewCopy } from '$lib/server/services/review-copy';

// The printable review copy: every role of the team may read it, like the route map.
export const load: PageServerLoad = async (event) => {
	const { route, project } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const document = await routeDocument(route);
	const copy = await reviewCopy(route, document);
	return {
		route: {
			id: route.id,
			name: route.name,
			status: route.status,
			statusLabel: ROUTE_STATUS_LABELS[route.status as RouteStatus],
			version: route.version
		},
		project: { id: project.id, name: project.name },
		printedAt: new Date().toISOString(),
		...copy
	};
};
