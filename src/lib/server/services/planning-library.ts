// What the planner reads of a team's condition library (issue 16): the approved, not retired
// entries, as plain JSON for the chemistry pool, each with its uses counted from the steps of the
// team's routes that name it (never a stored counter).

import { col, fn, literal, Op } from 'sequelize';
import type { SavedConditionEntry } from '../../rules/plan';
import { dbReady, SavedCondition, Step } from '../db';

/** The team's approved, not retired saved conditions with their uses, e.g. for `POST /api/routes/{id}/plan`. */
export async function approvedSavedConditions(teamId: string): Promise<SavedConditionEntry[]> {
	await dbReady();
	const rows = await SavedCondition.findAll({
		where: { teamId, approvedAt: { [Op.ne]: null }, retiredAt: null },
		order: [['createdAt', 'ASC']]
	});
	if (rows.length === 0) {
		return [];
	}
	const uses = await usesOf(
		teamId,
		rows.map((row) => row.id)
	);
	return rows.map((row) => ({
		id: row.id,
		protectingGroup: row.protectingGroup,
		kind: row.kind,
		reagents: row.reagents,
		yield: row.yield,
		reference: row.reference,
		scale: row.scale,
		notes: row.notes,
		uses: uses.get(row.id) ?? 0
	}));
}

/** Steps in the team's routes naming each entry, in one grouped query. */
async function usesOf(teamId: string, ids: string[]): Promise<Map<string, number>> {
	const escaped = Step.sequelize!.escape(teamId);
	// Only the team's routes count: a step elsewhere that names the id is not the team's use.
	const teamRoutes = literal(
		`(SELECT "routes"."id" FROM "routes" JOIN "projects" ON "projects"."id" = "routes"."projectId" WHERE "projects"."teamId" = ${escaped})`
	);
	const counted = (await Step.findAll({
		attributes: ['savedConditionId', [fn('COUNT', col('id')), 'uses']],
		where: { savedConditionId: { [Op.in]: ids }, routeId: { [Op.in]: teamRoutes } },
		group: ['savedConditionId'],
		raw: true
	})) as unknown as { savedConditionId: string; uses: number | string }[];
	// PostgreSQL answers COUNT as a string (bigint).
	return new Map(counted.map((row) => [row.savedConditionId, Number(row.uses)]));
}
