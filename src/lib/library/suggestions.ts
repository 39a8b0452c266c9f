// Which of the team's saved conditions the step panel offers for a step, and in which order.
// Pure data in, data out: the panel feeds it the protecting groups it sees on each side of the
// step (from the structures' analyses) and the step's intent.

import type { SavedConditionAnswer } from '../api/answers';
import type { StepIntent } from '../route/document';
import type { SavedConditionKind } from './contract';

/** A protecting group the step puts on (`install`) or takes off (`remove`). */
export type PgChange = { protectingGroup: string; kind: SavedConditionKind };

/**
 * The protecting groups that appear or disappear across a step, counted per id, e.g. substrates
 * `[['TBS']]` and product `['TBS', 'Bn']` → `[{ protectingGroup: 'Bn', kind: 'install' }]`.
 */
export function pgChanges(substrates: readonly (readonly string[])[], product: readonly string[]) {
	const balance = new Map<string, number>();
	for (const id of product) {
		balance.set(id, (balance.get(id) ?? 0) + 1);
	}
	for (const id of substrates.flat()) {
		balance.set(id, (balance.get(id) ?? 0) - 1);
	}
	const changes: PgChange[] = [];
	for (const [protectingGroup, net] of balance) {
		if (net !== 0) {
			changes.push({ protectingGroup, kind: net > 0 ? 'install' : 'remove' });
		}
	}
	return changes;
}

const KIND_OF_INTENT: Partial<Record<StepIntent, SavedConditionKind>> = {
	protect: 'install',
	deprotect: 'remove'
};

/**
 * The entries to offer: those for a protecting group the step puts on or takes off (`changes`),
 * or, when the structures show none (not drawn yet, or not read), every entry of the kind the
 * step's intent names. Retired entries never; approved first, then the most used, then the most
 * recently changed. A plain transformation gets nothing.
 */
export function suggestionsFor(
	entries: readonly SavedConditionAnswer[],
	changes: readonly PgChange[],
	intent: StepIntent | undefined
): SavedConditionAnswer[] {
	const intentKind = intent ? KIND_OF_INTENT[intent] : undefined;
	const matches = (entry: SavedConditionAnswer) =>
		changes.length > 0
			? changes.some((c) => c.protectingGroup === entry.protectingGroup && c.kind === entry.kind)
			: entry.kind === intentKind;
	return entries
		.filter((entry) => !entry.retired && matches(entry))
		.sort(
			(a, b) =>
				Number(b.approved) - Number(a.approved) ||
				b.uses - a.uses ||
				b.updatedAt.localeCompare(a.updatedAt)
		);
}

/**
 * The text a step gets when it follows an entry ("Use this", the planner): the reagents with the
 * solvent and the temperature, which the classifier also reads, e.g. 'TBSOTf, 2,6-lutidine,
 * CH2Cl2, −78 °C'. A part the reagents already name (ignoring case) is not written twice.
 */
export function stepReagentsOf(
	entry: Pick<SavedConditionAnswer, 'reagents' | 'solvent' | 'temperature'>
) {
	const reagents = entry.reagents.trim();
	const said = reagents.toLowerCase();
	const extra = [entry.solvent, entry.temperature]
		.map((part) => part?.trim())
		.filter((part): part is string => Boolean(part) && !said.includes(part!.toLowerCase()));
	return [reagents, ...extra].filter(Boolean).join(', ');
}
