import type { Transaction } from 'sequelize';
import {
	SAVED_CONDITION_KIND_LABELS,
	WRITABLE_CSV_COLUMNS,
	type NewSavedConditionBody,
	type SavedConditionFields,
	type SavedConditionPatch
} from '../../library/contract';
import { can, type Role } from '../../policy';
import type { SessionUser } from '../../types';
import { ApiFailure } from '../api';
import { dbReady, SavedCondition } from '../db';
import { recordActivity } from './activity';
import { usesOf } from './library';

// Writing the condition library. Every change commits with its activity event, all or nothing.

/** The fields a person writes, in one list shared with the CSV columns. */
export const WRITTEN_FIELDS = WRITABLE_CSV_COLUMNS;

/** How the activity feed names an entry, e.g. `TBS, puts it on: “TBSOTf, 2,6-lutidine”`. */
export function entryLabel(entry: Pick<SavedCondition, 'protectingGroup' | 'kind' | 'reagents'>) {
	const reagents = entry.reagents.length > 80 ? `${entry.reagents.slice(0, 79)}…` : entry.reagents;
	return `${entry.protectingGroup}, ${SAVED_CONDITION_KIND_LABELS[entry.kind].toLowerCase()}: “${reagents}”`;
}

/** Author or lead, and only while the role may still add to the library; 403 otherwise. */
export function assertMayChange(actor: SessionUser, role: Role, entry: SavedCondition) {
	const mayChange =
		can(role, 'library.approve') || (can(role, 'library.add') && entry.authorId === actor.id);
	if (!mayChange) {
		throw new ApiFailure(
			403,
			'forbidden',
			'Only the author of this library entry or a lead can change or delete it.'
		);
	}
}

/** Records a library event in the entry's team. */
function record(
	actor: SessionUser,
	entry: SavedCondition,
	kind: string,
	verb: string,
	transaction: Transaction
) {
	return recordActivity(
		{
			teamId: entry.teamId,
			actorId: actor.id,
			kind,
			summary: `${actor.name} ${verb} the saved condition ${entryLabel(entry)}.`,
			details: { savedConditionId: entry.id }
		},
		transaction
	);
}

/** Adds an entry to the team's library (the guard checked `library.add`); not yet approved. */
export async function createSavedCondition(
	actor: SessionUser,
	body: NewSavedConditionBody
): Promise<SavedCondition> {
	await dbReady();
	return SavedCondition.sequelize!.transaction(async (transaction) => {
		const entry = await SavedCondition.create(
			{ ...body, authorId: actor.id, approvedById: null, approvedAt: null, retiredAt: null },
			{ transaction }
		);
		await record(actor, entry, 'library.created', 'added', transaction);
		return entry;
	});
}

/** The written fields the patch changes, e.g. `{ yield: 91 }`. */
export function changedFields(
	entry: SavedCondition,
	patch: Partial<SavedConditionFields>
): Partial<SavedConditionFields> {
	return Object.fromEntries(
		WRITTEN_FIELDS.flatMap((field) =>
			patch[field] !== undefined && patch[field] !== entry[field] ? [[field, patch[field]]] : []
		)
	);
}

/**
 * Changes an entry's fields or retires and restores it (author or lead). A change to the written
 * fields by someone who cannot approve withdraws an approval, so "approved" always means a lead
 * saw these reagents. A patch that changes nothing writes nothing.
 */
export async function updateSavedCondition(
	actor: SessionUser,
	role: Role,
	entry: SavedCondition,
	patch: SavedConditionPatch
): Promise<void> {
	assertMayChange(actor, role, entry);
	const fields = changedFields(entry, patch);
	const edited = Object.keys(fields).length > 0;
	const retiring = patch.retired !== undefined && patch.retired !== (entry.retiredAt !== null);
	if (!edited && !retiring) {
		return;
	}
	const withdrawn = edited && entry.approvedAt !== null && !can(role, 'library.approve');
	await dbReady();
	await SavedCondition.sequelize!.transaction(async (transaction) => {
		await entry.update(
			{
				...fields,
				...(withdrawn ? { approvedAt: null, approvedById: null } : {}),
				...(retiring ? { retiredAt: patch.retired ? new Date() : null } : {})
			},
			{ transaction }
		);
		if (edited) {
			const verb = withdrawn
				? 'changed (approval withdrawn until a lead approves it again)'
				: 'changed';
			await record(actor, entry, 'library.updated', verb, transaction);
		}
		if (retiring) {
			const [kind, verb] = patch.retired
				? ['library.retired', 'retired']
				: ['library.restored', 'restored'];
			await record(actor, entry, kind, verb, transaction);
		}
	});
}

/**
 * Deletes an entry (author or lead). An entry that steps still follow is refused (409): its
 * links would dangle; retiring keeps it on record and stops suggesting it.
 */
export async function deleteSavedCondition(
	actor: SessionUser,
	role: Role,
	entry: SavedCondition
): Promise<void> {
	assertMayChange(actor, role, entry);
	const uses = (await usesOf([entry.id]))[entry.id] ?? 0;
	if (uses > 0) {
		throw new ApiFailure(
			409,
			'in_use',
			`${uses} step${uses === 1 ? '' : 's'} of the team's routes follow this entry, so it cannot be deleted. Retire it instead: it stays on record and is no longer suggested.`,
			{ uses }
		);
	}
	await SavedCondition.sequelize!.transaction(async (transaction) => {
		await entry.destroy({ transaction });
		await record(actor, entry, 'library.deleted', 'deleted', transaction);
	});
}

/** Approves an entry (the guard checked `library.approve`); approving it again changes nothing. */
export async function approveSavedCondition(
	actor: SessionUser,
	entry: SavedCondition
): Promise<void> {
	if (entry.approvedAt !== null) {
		return;
	}
	await dbReady();
	await SavedCondition.sequelize!.transaction(async (transaction) => {
		await entry.update({ approvedAt: new Date(), approvedById: actor.id }, { transaction });
		await record(actor, entry, 'library.approved', 'approved', transaction);
	});
}
