import type { PageServerLoad } from './$types';
import { can } from '$lib/policy';
import { analyzeStructure, type Analysis } from '$lib/chem';
import { requireRouteAction } from '$lib/server/auth/guards';
import { routeDocument, routeLinks } from '$lib/server/services/routes';

export const load: PageServerLoad = async (event) => {
	const { route, project, role } = await requireRouteAction(
		event,
		event.params.routeId,
		'project.read'
	);
	const [document, links] = await Promise.all([routeDocument(route), routeLinks(route)]);
	// Depictions come with the page, so a reload shows the drawings without a request per node;
	// a structure that cannot be read is left out and its node shows the reason instead.
	const analyses: Record<string, Analysis> = {};
	for (const node of document.intermediates) {
		if (analyses[node.structure]) continue;
		try {
			analyses[node.structure] = analyzeStructure(node.structure, { depict: true });
		} catch {
			// The node asks /api/analyze itself and shows that answer's message.
		}
	}
	return {
		route: {
			id: route.id,
			name: route.name,
			status: route.status,
			version: route.version,
			archived: route.archivedAt !== null
		},
		project: { id: project.id, name: project.name },
		document,
		analyses,
		links,
		role,
		canEdit: can(role, 'route.edit')
	};
};
