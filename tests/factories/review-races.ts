import { Project, ReviewEvent, Route } from '../../src/lib/server/db';
import type { SessionUser } from '../../src/lib/types';
import { approvedVersionOf } from '../../src/lib/server/services/review';
import { takeReviewAction } from '../../src/lib/server/services/review-actions';
import { createRoute, saveRoute } from '../../src/lib/server/services/routes';

// Races between review actions and saves, run the same way on SQLite and PostgreSQL. Each
// takes copies of the route read before any of the racers writes, as two servers would.

const doc = (name: string) => ({ name, intermediates: [{ id: 'a', structure: 'CCO' }], steps: [] });

export type RacePeople = { chemist: SessionUser; reviewer: SessionUser; lead: SessionUser };

/** A route of the chemist's, already in review (set directly, not through the API). */
async function routeInReview(people: RacePeople, project: Project, name: string) {
	const route = await createRoute(people.chemist, project, doc(name));
	await Route.update({ status: 'in-review' }, { where: { id: route.id } });
	return (await Route.findByPk(route.id))!;
}

/**
 * `count` verdicts on one route at once (approve and request-changes, alternating) from copies
 * read while it was in review: how many went through, what the others were refused with, and
 * how many history lines were written.
 */
export async function parallelVerdicts(people: RacePeople, project: Project, count: number) {
	const route = await routeInReview(people, project, 'Contested verdicts');
	const settled = await Promise.allSettled(
		Array.from({ length: count }, (_, i) =>
			i % 2 === 0
				? takeReviewAction(people.reviewer, 'reviewer', route, project, { action: 'approve' })
				: takeReviewAction(people.lead, 'lead', route, project, {
						action: 'request-changes',
						note: `Objection ${i}`
					})
		)
	);
	return {
		passed: settled.filter((s) => s.status === 'fulfilled').length,
		refusals: settled.flatMap((s) =>
			s.status === 'rejected' ? [(s.reason as { code?: string }).code] : []
		),
		events: await ReviewEvent.count({ where: { routeId: route.id } })
	};
}

/**
 * On each of `count` routes in review, an approval and a save race. Whichever wins, a route that
 * ends approved must have been approved at the version it now has: nobody approved an edit they
 * had not seen. `withVersion` sends the version the reviewer read, as the page does.
 */
export async function approvalsAgainstSaves(
	people: RacePeople,
	project: Project,
	count: number,
	withVersion: boolean
) {
	const routes = await Promise.all(
		Array.from({ length: count }, (_, i) => routeInReview(people, project, `Race ${i}`))
	);
	await Promise.allSettled(
		routes.flatMap((route) => [
			takeReviewAction(people.reviewer, 'reviewer', route, project, {
				action: 'approve',
				...(withVersion ? { version: route.version } : {})
			}),
			saveRoute(people.chemist, route, route.version, doc('Edited'), project.teamId)
		])
	);
	const outcomes = await Promise.all(
		routes.map(async (route) => {
			const now = (await Route.findByPk(route.id))!;
			return {
				status: now.status,
				version: now.version,
				approvedVersion: await approvedVersionOf(route.id)
			};
		})
	);
	return outcomes;
}
