import { Op, type Transaction } from 'sequelize';
import type { RouteDocument } from '../../route/document';
import { ApiFailure } from '../api';
import { SavedCondition } from '../db';

/**
 * Refuses (422 `unknown_saved_condition`, naming the step) a route document whose step names a
 * saved condition that is not an entry of the route's team. Retired entries still count: a route
 * that follows one must keep saving.
 */
export async function assertSavedConditionsOfTeam(
	doc: RouteDocument,
	teamId: string,
	transaction?: Transaction
): Promise<void> {
	const named = [...new Set(doc.steps.flatMap((step) => step.savedCondition ?? []))];
	if (named.length === 0) {
		return;
	}
	const found = await SavedCondition.findAll({
		attributes: ['id'],
		where: { teamId, id: { [Op.in]: named } },
		transaction
	});
	const known = new Set(found.map((entry) => entry.id));
	const step = doc.steps.find((s) => s.savedCondition && !known.has(s.savedCondition));
	if (step) {
		throw new ApiFailure(
			422,
			'unknown_saved_condition',
			`Step “${step.id}” follows the saved condition ${step.savedCondition}, which is not in this team's condition library.`,
			{ stepId: step.id, savedCondition: step.savedCondition }
		);
	}
}
