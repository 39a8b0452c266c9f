import type { Transaction } from 'sequelize';
import { ActivityEvent, dbReady, User } from '../db';

export type ActivityInput = {
	teamId: string;
	actorId: string | null;
	kind: string;
	summary: string;
	projectId?: string | null;
	routeId?: string | null;
	details?: Record<string, unknown>;
};

export async function recordActivity(input: ActivityInput, transaction?: Transaction) {
	await ActivityEvent.create(
		{
			teamId: input.teamId,
			actorId: input.actorId,
			kind: input.kind,
			summary: input.summary,
			projectId: input.projectId ?? null,
			routeId: input.routeId ?? null,
			details: input.details ?? null
		},
		{ transaction }
	);
}

export type ActivityLine = { id: string; summary: string; actorName: string | null; at: Date };

/** The newest events of a team, or of one project when `projectId` is given. */
export async function recentActivity(
	where: { teamId: string; projectId?: string },
	limit = 20
): Promise<ActivityLine[]> {
	await dbReady();
	const events = await ActivityEvent.findAll({
		where,
		order: [['createdAt', 'DESC']],
		limit,
		include: [{ model: User, as: 'actor', attributes: ['name'] }]
	});
	return events.map((e) => ({
		id: e.id,
		summary: e.summary,
		actorName: e.actor?.name ?? null,
		at: e.createdAt
	}));
}
