// What the planner reads of a team's condition library (issue 16): the approved, not retired
// entries, as plain JSON for the chemistry pool, each with its uses counted from the steps of the
// team's routes that name it (never a stored counter).

import { Op } from 'sequelize';
import type { SavedConditionEntry } from '../../rules/plan';
import { dbReady, SavedCondition } from '../db';
import { stepReagentsOf } from '../../library/suggestions';
import { usesOf } from './library';

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
	const uses = await usesOf(rows.map((row) => row.id));
	return rows.map((row) => ({
		id: row.id,
		protectingGroup: row.protectingGroup,
		kind: row.kind,
		// What the added step carries: as "Use this" writes it, with the solvent and temperature.
		reagents: stepReagentsOf(row),
		yield: row.yield,
		reference: row.reference,
		scale: row.scale,
		notes: row.notes,
		uses: uses[row.id] ?? 0
	}));
}
