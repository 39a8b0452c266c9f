import { Op } from 'sequelize';
import { z } from 'zod';
import type { LibraryImportAnswer } from '../../api/answers';
import type { ImportRowProblem } from '../../library/contract';
import { can, type Role } from '../../policy';
import type { SessionUser } from '../../types';
import { dbReady, SavedCondition } from '../db';
import { recordActivity } from './activity';
import { invalidRows, readLibraryCsv, type CsvRow } from './library-csv';
import { changedFields } from './library-writes';

const uuid = z.uuid();

type Plan = {
	creates: CsvRow[];
	updates: { entry: SavedCondition; fields: ReturnType<typeof changedFields> }[];
	unchanged: number;
};

/**
 * What each row does: a row whose `id` names an entry of this team changes that entry (its
 * author or a lead) or, equal to it, nothing; any other row adds an entry.
 */
async function planImport(actor: SessionUser, role: Role, teamId: string, rows: CsvRow[]) {
	const ids = [
		...new Set(rows.flatMap((row) => (row.id && uuid.safeParse(row.id).success ? [row.id] : [])))
	];
	const existing = ids.length
		? await SavedCondition.findAll({ where: { teamId, id: { [Op.in]: ids } } })
		: [];
	const byId = new Map(existing.map((entry) => [entry.id, entry]));
	const plan: Plan = { creates: [], updates: [], unchanged: 0 };
	const problems: ImportRowProblem[] = [];
	const seen = new Map<string, number>();
	for (const row of rows) {
		const entry = row.id ? byId.get(row.id) : undefined;
		if (!entry) {
			plan.creates.push(row);
			continue;
		}
		if (seen.has(entry.id)) {
			problems.push({
				row: row.row,
				column: 'id',
				reason: `Row ${seen.get(entry.id)} already names this entry; keep one row per entry.`
			});
			continue;
		}
		seen.set(entry.id, row.row);
		const fields = changedFields(entry, row.fields);
		if (Object.keys(fields).length === 0) {
			plan.unchanged += 1;
		} else if (!can(role, 'library.approve') && entry.authorId !== actor.id) {
			problems.push({
				row: row.row,
				column: 'id',
				reason:
					'Only its author or a lead can change this entry; leave the row as exported or remove it.'
			});
		} else {
			plan.updates.push({ entry, fields });
		}
	}
	if (problems.length > 0) {
		throw invalidRows(problems);
	}
	return plan;
}

/**
 * Imports a library CSV into the team (the guard checked `library.add`): every row or none, in
 * one transaction with one activity event. New entries are not approved, whoever imports them;
 * a change by someone who cannot approve withdraws the entry's approval, as an edit does.
 */
export async function importLibraryCsv(
	actor: SessionUser,
	role: Role,
	teamId: string,
	file: { name: string; text: string }
): Promise<LibraryImportAnswer> {
	const rows = readLibraryCsv(file.text);
	await dbReady();
	const plan = await planImport(actor, role, teamId, rows);
	const mayApprove = can(role, 'library.approve');
	await SavedCondition.sequelize!.transaction(async (transaction) => {
		await SavedCondition.bulkCreate(
			plan.creates.map((row) => ({
				...row.fields,
				teamId,
				authorId: actor.id,
				approvedById: null,
				approvedAt: null,
				retiredAt: null
			})),
			{ transaction }
		);
		for (const { entry, fields } of plan.updates) {
			const withdrawn = entry.approvedAt !== null && !mayApprove;
			await entry.update(
				{ ...fields, ...(withdrawn ? { approvedAt: null, approvedById: null } : {}) },
				{ transaction }
			);
		}
		await recordActivity(
			{
				teamId,
				actorId: actor.id,
				kind: 'library.imported',
				summary: `${actor.name} imported “${file.name}” into the condition library: ${plan.creates.length} added, ${plan.updates.length} changed, ${plan.unchanged} unchanged.`,
				details: {
					created: plan.creates.length,
					updated: plan.updates.map(({ entry }) => entry.id)
				}
			},
			transaction
		);
	});
	return { created: plan.creates.length, updated: plan.updates.length, unchanged: plan.unchanged };
}
