import { error } from '@sveltejs/kit';
import { validateRouteDocument, type RouteDocument } from '../route/document';

/** A route document from a request body, or a 422 that names every problem found. */
export function routeDocumentOr422(input: unknown): RouteDocument {
	const result = validateRouteDocument(input);
	if (result.ok) {
		return result.document;
	}
	const [first] = result.problems;
	const where = first!.path.length ? ` (at ${first!.path.join('.')})` : '';
	error(422, {
		code: 'invalid_route',
		message: `${first!.message}${where}${result.problems.length > 1 ? ` — and ${result.problems.length - 1} more problem(s)` : ''}`,
		details: result.problems
	});
}
