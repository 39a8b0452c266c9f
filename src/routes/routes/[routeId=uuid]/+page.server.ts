import type { PageServerLoad } from './$types';
import { can } from '$lib/policy';
import type { Analysis } from '$lib/chem';
import { ApiFailure } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { chemPoolConfig } from '$lib/server/chem-pool/config';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeMapLabels } from '$lib/server/route-map-labels';
import { listComments } from '$lib/server/services/comments';
import { listSavedConditions } from '$lib/server/services/library';
import { reviewCandidates, reviewHistory } from '$lib/server/services/review';
import { approvedVersionIn } from '$lib/review/history';
import { routeDocument, routeLinks } from '$lib/server/services/routes';

export const load: PageServerLoad = async (event) => {
	const { user, route, project, role } = await requireRouteAction(
		event,
		event.params.routeId,
		'project.read'
	);
	const [document, links, comments, history, reviewers, library] = await Promise.all([
		routeDocument(route),
		routeLinks(route),
		listComments(route.id),
		reviewHistory(route.id),
		reviewCandidates(project.teamId),
		// The step panel's suggestions (issue 16): the team's saved conditions.
		listSavedConditions([project.teamId], {})
	]);
	const approvedVersion = approvedVersionIn(history);
	// Depictions come with the page, so a reload shows the drawings without a request per node.
	// They are drawn on the chemistry pool within the page budget; when it runs out (or the pool
	// is busy) the page comes without them and each node asks /api/analyze itself, showing that
	// answer (or its message). A structure that cannot be read is left out the same way.
	let analyses: Record<string, Analysis> = {};
	try {
		analyses = await runChemistry(
			'drawRoute',
			{ structures: document.intermediates.map((node) => node.structure) },
			{ budgetMs: chemPoolConfig().pageBudgetMs }
		);
	} catch (caught) {
		if (!(caught instanceof ApiFailure)) {
			throw caught;
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
		project: { id: project.id, name: project.name, teamId: project.teamId },
		document,
		analyses,
		// The names the map shows for condition, group and protecting-group ids (no /api/rules call).
		labels: routeMapLabels(),
		library,
		links,
		role,
		canEdit: can(role, 'route.edit'),
		canSaveConditions: can(role, 'library.add'),
		// Review (issue 15): the threads, the history and who may be asked. The page only hides
		// what a role cannot use; the API enforces it.
		comments,
		history,
		approvedVersion,
		reviewers,
		userId: user.id,
		canComment: can(role, 'route.comment'),
		canReview: can(role, 'route.review'),
		canRequest: can(role, 'route.edit')
	};
};
