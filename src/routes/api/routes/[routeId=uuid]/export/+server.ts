import type { RequestHandler } from './$types';
import { ApiFailure, apiError, apiHandler } from '$lib/server/api';
import { requireRouteAction } from '$lib/server/auth/guards';
import { runChemistry } from '$lib/server/chem-pool/pool';
import { routeDocument } from '$lib/server/services/routes';

/** A file name from the route name: letters, digits and dashes only, so every OS accepts it. */
const fileName = (name: string, ext: string) =>
	`${
		name
			.normalize('NFKD')
			.replace(/[^\w-]+/g, '-')
			.replace(/^-+|-+$/g, '')
			.slice(0, 60) || 'route'
	}.${ext}`;

/** `GET /api/routes/{id}/export?format=sdf|json` → the route as an SDF or a route document file. */
export const GET: RequestHandler = apiHandler(async (event) => {
	const { route } = await requireRouteAction(event, event.params.routeId, 'project.read');
	const format = event.url.searchParams.get('format') ?? 'json';
	if (format !== 'sdf' && format !== 'json') {
		return apiError(400, 'bad_format', `Export as “sdf” or “json”, not “${format}”.`);
	}
	const stored = await routeDocument(route);
	// A step's saved condition is an id in this team's library: the file leaves the team, and
	// imported into another team's project the id would be refused, so it is not written.
	const document = {
		...stored,
		steps: stored.steps.map(({ savedCondition: _unused, ...step }) => step)
	};
	let body: string;
	try {
		body =
			format === 'sdf'
				? await runChemistry('exportSdf', { document })
				: JSON.stringify(document, null, 2);
	} catch (caught) {
		// A structure that cannot be written as SDF; a busy or slow pool keeps its own answer.
		if (caught instanceof ApiFailure && caught.status === 422) {
			return apiError(422, 'unexportable', caught.message);
		}
		throw caught;
	}
	return new Response(body, {
		headers: {
			'content-type':
				format === 'sdf'
					? 'chemical/x-mdl-sdfile; charset=utf-8'
					: 'application/json; charset=utf-8',
			'content-disposition': `attachment; filename="${fileName(route.name, format)}"`,
			'cache-control': 'no-store'
		}
	});
});
