import { ZodError } from 'zod';
import type { RuleOverrideAnswer } from '../../api/answers';
import { loadRuleTable } from '../../rules/table';
import { ruleOverrideBody, type RuleOverrideBody } from '../../team-rules/contract';
import { checkOverride, type OverrideField } from '../../team-rules/validate';
import type { SessionUser } from '../../types';
import { ApiFailure } from '../api';
import { dbReady, Team, TeamRuleOverride, User } from '../db';
import { recordActivity } from './activity';

/** The fields a 422 names; a body that is not an object at all stays a 400 (`invalid_body`). */
const FIELDS = Object.keys(ruleOverrideBody.shape) as OverrideField[];

/** 422 `invalid` naming the field, in the message and in `details.field`. */
export class OverrideRefused extends ApiFailure {
	constructor(
		readonly field: OverrideField,
		/** The reason alone, for a form that shows it under the field. */
		readonly reason: string
	) {
		super(422, 'invalid', `${field}: ${reason}`, { field });
	}
}

/**
 * Reads `POST /api/teams/{teamId}/rules`'s body: a field zod refuses (an unknown condition class,
 * a rating no subject has, a NUL in the reason) → 422 naming it; anything else → 400.
 */
export function parseOverrideBody(raw: unknown): RuleOverrideBody {
	const parsed = ruleOverrideBody.safeParse(raw);
	if (parsed.success) {
		return parsed.data;
	}
	const issue = parsed.error.issues.find((i) => FIELDS.includes(i.path[0] as OverrideField));
	if (!issue) {
		throw new ZodError(parsed.error.issues);
	}
	throw new OverrideRefused(issue.path[0] as OverrideField, issue.message);
}

function answerOf(row: TeamRuleOverride): RuleOverrideAnswer {
	return {
		id: row.id,
		subject: row.subject,
		condition: row.condition,
		...(row.reagent ? { reagent: row.reagent } : {}),
		rating: row.rating,
		reason: row.reason,
		source: row.source,
		author: row.author ? { id: row.author.id, name: row.author.name } : null,
		createdAt: row.createdAt.toISOString()
	};
}

/** The team's overrides, oldest first (the order they were decided in). */
export async function listOverrides(teamId: string): Promise<RuleOverrideAnswer[]> {
	await dbReady();
	const rows = await TeamRuleOverride.findAll({
		where: { teamId },
		order: [
			['createdAt', 'ASC'],
			['id', 'ASC']
		],
		include: [{ model: User, as: 'author', attributes: ['id', 'name'] }]
	});
	return rows.map(answerOf);
}

/** "TBS under Fluoride (TBAF only)", for the activity feed. */
function cellName(row: { subject: string; condition: string; reagent?: string | null }): string {
	const label = loadRuleTable().conditions.find((c) => c.id === row.condition)?.label;
	const under = `${row.subject} under ${label ?? row.condition}`;
	return row.reagent ? `${under} (${row.reagent} only)` : under;
}

/**
 * Stores one override after checking it against the rule table (422 naming the field). A second
 * override of the same cell (subject, class, reagent) is refused with 409 `override_exists`: the
 * lead removes the old one first, so the feed shows both decisions and nothing is replaced
 * unseen. The team's row is locked for the check, so two servers cannot both insert the cell.
 */
export async function addOverride(
	actor: SessionUser,
	teamId: string,
	body: RuleOverrideBody
): Promise<{ id: string }> {
	await dbReady();
	const checked = checkOverride(loadRuleTable(), body);
	if (!checked.ok) {
		throw new OverrideRefused(checked.problem.field, checked.problem.message);
	}
	const { override } = checked;
	return TeamRuleOverride.sequelize!.transaction(async (transaction) => {
		await Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE });
		const cell = {
			teamId,
			subject: override.subject,
			condition: override.condition,
			reagent: override.reagent ?? null
		};
		const existing = await TeamRuleOverride.findOne({ where: cell, transaction });
		if (existing) {
			throw new ApiFailure(
				409,
				'override_exists',
				`The team already rates ${cellName(override)} as ${existing.rating}; remove that override first to set another.`,
				{ id: existing.id }
			);
		}
		const row = await TeamRuleOverride.create(
			{
				...cell,
				rating: override.rating,
				reason: override.reason,
				source: override.source,
				authorId: actor.id
			},
			{ transaction }
		);
		await recordActivity(
			{
				teamId,
				actorId: actor.id,
				kind: 'rules.override-added',
				summary: `${actor.name} set a team rule: ${cellName(override)} is ${override.rating}.`,
				details: { overrideId: row.id, ...cell, rating: override.rating, reason: override.reason }
			},
			transaction
		);
		return { id: row.id };
	});
}

/** Removes one of the team's overrides; another team's or an unknown id is 404. */
export async function removeOverride(
	actor: SessionUser,
	teamId: string,
	overrideId: string
): Promise<void> {
	await dbReady();
	await TeamRuleOverride.sequelize!.transaction(async (transaction) => {
		const row = await TeamRuleOverride.findOne({ where: { id: overrideId, teamId }, transaction });
		if (!row) {
			throw new ApiFailure(
				404,
				'not_found',
				'That rule override does not exist, or is not shared with you.'
			);
		}
		await row.destroy({ transaction });
		const { subject, condition, reagent, rating } = row;
		await recordActivity(
			{
				teamId,
				actorId: actor.id,
				kind: 'rules.override-removed',
				summary: `${actor.name} removed the team rule ${cellName(row)} (was ${rating}); the table’s rating applies again.`,
				details: { overrideId, subject, condition, reagent, rating }
			},
			transaction
		);
	});
}
