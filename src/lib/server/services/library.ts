import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import type { SavedConditionAnswer } from '../../api/answers';
import type { LibraryQuery } from '../../library/contract';
import { stepReagentsOf } from '../../library/suggestions';
import { loadRuleTable } from '../../rules/table';
import { dbReady, SavedCondition, User } from '../db';

// Reading the condition library. Writing it is in library-writes.ts, CSV in library-csv.ts.

/**
 * How many steps of the team's routes name each entry, e.g. `{ [entryId]: 2 }` (absent: 0).
 * One grouped query over the steps as they are stored now, so the count cannot drift from them;
 * a step counts only when its route's project belongs to the entry's team.
 */
export async function usesOf(entryIds: string[]): Promise<Record<string, number>> {
	if (entryIds.length === 0) {
		return {};
	}
	await dbReady();
	const rows = await SavedCondition.sequelize!.query<{ id: string; uses: number | string }>(
		`SELECT s."savedConditionId" AS id, COUNT(*) AS uses
		 FROM steps s
		 JOIN routes r ON r.id = s."routeId"
		 JOIN projects p ON p.id = r."projectId"
		 JOIN saved_conditions c ON c.id = s."savedConditionId" AND c."teamId" = p."teamId"
		 WHERE s."savedConditionId" IN (:entryIds)
		 GROUP BY s."savedConditionId"`,
		{ replacements: { entryIds }, type: QueryTypes.SELECT }
	);
	// PostgreSQL answers COUNT(*) as a string (bigint).
	return Object.fromEntries(rows.map((row) => [row.id, Number(row.uses)]));
}

/**
 * A stored entry in the API's shape. Its classes, hazards and unrecognised text are read on every
 * answer from what a step following it carries (`stepReagentsOf`), never stored.
 */
export function savedConditionAnswer(entry: SavedCondition, uses: number): SavedConditionAnswer {
	const read = loadRuleTable().conditionsForReagents(stepReagentsOf(entry));
	return {
		id: entry.id,
		teamId: entry.teamId,
		protectingGroup: entry.protectingGroup,
		kind: entry.kind,
		reagents: entry.reagents,
		conditions: [...read.conditions],
		hazards: read.hazards.map(({ reagent, note }) => ({ reagent, note })),
		unrecognized: [...read.unknown],
		solvent: entry.solvent,
		temperature: entry.temperature,
		time: entry.time,
		scale: entry.scale,
		yield: entry.yield,
		reference: entry.reference,
		notes: entry.notes,
		author: entry.author ? { id: entry.author.id, name: entry.author.name } : null,
		approved: entry.approvedAt !== null,
		retired: entry.retiredAt !== null,
		uses,
		createdAt: entry.createdAt.toISOString(),
		updatedAt: entry.updatedAt.toISOString()
	};
}

const withAuthor = [{ model: User, as: 'author', attributes: ['id', 'name'] }];

/** One entry with its author, or null. */
export async function findSavedCondition(id: string): Promise<SavedCondition | null> {
	await dbReady();
	return SavedCondition.findByPk(id, { include: withAuthor });
}

/** One entry as the API answers it, uses counted now. */
export async function savedConditionAnswerOf(id: string): Promise<SavedConditionAnswer> {
	const entry = (await findSavedCondition(id))!;
	const uses = await usesOf([entry.id]);
	return savedConditionAnswer(entry, uses[entry.id] ?? 0);
}

/** Whether the search text occurs in one of the entry's searched fields, ignoring case. */
function matchesSearch(entry: SavedCondition, q: string): boolean {
	const needle = q.toLocaleLowerCase();
	return [entry.reagents, entry.solvent, entry.notes, entry.reference].some((field) =>
		field?.toLocaleLowerCase().includes(needle)
	);
}

/**
 * The entries of `teamIds` that pass the query's filters, oldest first, retired ones included
 * (`retired: true`). The caller has narrowed `teamIds` to the caller's own teams.
 */
export async function listSavedConditions(
	teamIds: string[],
	query: Omit<LibraryQuery, 'teamId'>
): Promise<SavedConditionAnswer[]> {
	if (teamIds.length === 0) {
		return [];
	}
	await dbReady();
	const where: WhereOptions<SavedCondition> = {
		teamId: { [Op.in]: teamIds },
		...(query.protectingGroup ? { protectingGroup: query.protectingGroup } : {}),
		...(query.kind ? { kind: query.kind } : {}),
		...(query.approved === 'true' ? { approvedAt: { [Op.ne]: null } } : {}),
		...(query.approved === 'false' ? { approvedAt: null } : {})
	};
	const entries = await SavedCondition.findAll({
		where,
		include: withAuthor,
		order: [
			['createdAt', 'ASC'],
			['id', 'ASC']
		]
	});
	// The search runs here, not as SQL LIKE: LIKE's case rules and wildcards differ between SQLite
	// and PostgreSQL, and a team's library is small enough to read whole.
	const found = query.q ? entries.filter((entry) => matchesSearch(entry, query.q!)) : entries;
	const uses = await usesOf(found.map((entry) => entry.id));
	return found.map((entry) => savedConditionAnswer(entry, uses[entry.id] ?? 0));
}
