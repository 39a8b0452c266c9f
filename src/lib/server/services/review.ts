import { Op } from 'sequelize';
import type { PersonRef, ReviewHistoryEntry } from '../../api/answers';
import { can } from '../../policy';
import { REVIEWER_GRANT } from '../../review/contract';
import { dbReady, Membership, ReviewEvent, User } from '../db';

// Reading a route's review state. The actions (request, approve, …) are in review-actions.ts.

/** The version the route's latest approval was given to, or null if it was never approved. */
export async function approvedVersionOf(routeId: string): Promise<number | null> {
	await dbReady();
	const latest = await ReviewEvent.findOne({
		where: { routeId, action: 'approve' },
		order: [
			['createdAt', 'DESC'],
			['version', 'DESC']
		],
		attributes: ['version']
	});
	return latest?.version ?? null;
}

/** The route's review history, oldest first, with the people named. */
export async function reviewHistory(routeId: string): Promise<ReviewHistoryEntry[]> {
	await dbReady();
	const events = await ReviewEvent.findAll({
		where: { routeId },
		// The same tie-break as approvedVersionOf, so approvedVersionIn(history) agrees with it.
		order: [
			['createdAt', 'ASC'],
			['version', 'ASC']
		],
		include: [{ model: User, as: 'actor', attributes: ['id', 'name'] }]
	});
	const reviewerIds = [...new Set(events.flatMap((event) => event.reviewerIds ?? []))];
	const reviewers = reviewerIds.length
		? await User.findAll({ where: { id: { [Op.in]: reviewerIds } }, attributes: ['id', 'name'] })
		: [];
	const byId = new Map(reviewers.map((user) => [user.id, { id: user.id, name: user.name }]));
	return events.map((event) => ({
		id: event.id,
		action: event.action,
		actor: event.actor ? { id: event.actor.id, name: event.actor.name } : null,
		reviewers: (event.reviewerIds ?? []).flatMap((id) => {
			const person = byId.get(id);
			return person ? [person] : [];
		}),
		note: event.note,
		version: event.version,
		createdAt: event.createdAt.toISOString()
	}));
}

export type ReviewCandidate = PersonRef & { email: string };

/** The team's members who may review (their role grants `route.review`), by name. */
export async function reviewCandidates(teamId: string): Promise<ReviewCandidate[]> {
	await dbReady();
	const memberships = await Membership.findAll({
		where: { teamId },
		include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }]
	});
	return memberships
		.filter((m) => m.user && can(m.role, REVIEWER_GRANT))
		.map((m) => ({ id: m.user!.id, name: m.user!.name, email: m.user!.email }))
		.sort((a, b) => a.name.localeCompare(b.name));
}
