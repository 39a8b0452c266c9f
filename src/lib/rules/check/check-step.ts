// The clash check for one step: which of the step's condition classes would strip a protecting
// group that the step keeps, or attack a free group that is meant to stand by.

import { isStructureError } from '../../chem/errors';
import { readStructure } from '../../chem/parse';
import { transformation, type Site } from './transformation';
import { conditionOrigins } from './condition-origins';
import { protectingGroupMessage, freeGroupMessage, twinSiteMessage } from './messages';
import {
	StepStructureError,
	UnknownConditionError,
	type CheckRules,
	type Clash,
	type ReagentMatch,
	type ReagentReading,
	type StepCheck,
	type StepToCheck
} from './types';

/**
 * Checks one step, e.g. `{ substrate: 'CC(=O)CCC(=O)OC', product: 'CC(=O)CCC(C)(C)O',
 * reagents: 'MeMgBr, THF' }` → a `clash` that the organometallic attacks the free ketone.
 */
export function checkStep(rules: CheckRules, step: StepToCheck): StepCheck {
	const explicit = step.conditions ?? [];
	const unknown = explicit.filter((id) => !rules.conditionIds.includes(id));
	if (unknown.length) {
		throw new UnknownConditionError(step.id, unknown, rules.conditionIds);
	}
	const classified = step.reagents?.trim()
		? rules.classify(step.reagents)
		: { conditions: [], matched: [], hazards: [], unknown: [] };
	const reagentClasses = classified.matched.map(readingOf);
	const origins = new Map(conditionOrigins(explicit, classified).map((o) => [o.id, o]));
	const conditions = [...origins.keys()];

	const substrates = Array.isArray(step.substrate) ? step.substrate : [step.substrate];
	const change = readTransformation(step.id, substrates, step.product);
	const clashes: Clash[] = [];
	for (const condition of conditions) {
		const origin = origins.get(condition)!;
		// A class set by hand that no reagent brings has no reagents: the class rating applies.
		const named = origin.reagents.map((b) => b.reagent);
		for (const pg of change.protectingGroups.filter(standsBy)) {
			const answer = rules.stability(pg.id, condition, named, pg.on);
			if (answer.rating === 'stable') {
				continue;
			}
			clashes.push({
				severity: answer.rating === 'labile' ? 'clash' : 'caution',
				kind: 'removes-protecting-group',
				subject: pg.id,
				condition,
				atoms: pg.atoms,
				message: protectingGroupMessage(
					rules,
					pg.id,
					condition,
					{ ...answer, rating: answer.rating },
					origin
				)
			});
		}
		for (const group of change.freeGroups.filter(standsBy)) {
			const rule = rules.reactivity(group.id, condition, named);
			if (!rule) {
				continue;
			}
			// A selective install (TBDPSCl on the primary alcohol beside a secondary one) leaves the
			// slower group: still worth watching, no longer a clash.
			const selective =
				rule.rating === 'reacts'
					? takenFirst(rules, change.freeGroups, group.id, condition, named)
					: null;
			// The other alcohol of a symmetric diol, one of which the step converts: whether it
			// reacts too is a question of selectivity the chemist drew on purpose, not a clash.
			// A team's own rating stays as the team set it.
			const twin =
				rule.rating === 'reacts' &&
				!selective &&
				rule.layer !== 'override' &&
				group.twinOfConverted === true;
			clashes.push({
				severity: rule.rating === 'reacts' && !selective && !twin ? 'clash' : 'caution',
				kind: 'attacks-free-group',
				subject: group.id,
				condition,
				atoms: group.atoms,
				message:
					selective ??
					(twin
						? twinSiteMessage(rules, group.id, condition, rule, origin)
						: freeGroupMessage(rules, group.id, condition, rule, origin))
			});
		}
	}
	clashes.sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'clash' ? -1 : 1));
	// Unrecognised reagent text is part of the answer: a step must not read clean because the
	// table did not know what was in the flask.
	return {
		id: step.id,
		conditions,
		reagentClasses,
		hazards: classified.hazards,
		clashes,
		unrecognized: classified.unknown
	};
}

const standsBy = (site: Site) => site.survives;

/**
 * Why the step's install recipe takes a group it converts before the standing-by `over`, as a
 * caution message, or null, e.g. "TBDPSCl takes the free primary alcohol before the free
 * secondary alcohol, which this step leaves alone: …".
 */
function takenFirst(
	rules: CheckRules,
	groups: Site[],
	over: string,
	condition: string,
	reagents: string[]
): string | null {
	if (!rules.installPreference || reagents.length === 0) {
		return null;
	}
	for (const converted of groups.filter((g) => !g.survives)) {
		const reason = rules.installPreference(reagents, condition, converted.id, over);
		if (reason) {
			return `${reagents.join(', ')} takes the free ${rules.groupLabel(converted.id)} before the free ${rules.groupLabel(over)}, which this step leaves alone: ${reason.trim().replace(/\.$/, '')}; some of the ${rules.groupLabel(over)} may react as well.`;
		}
	}
	return null;
}

/** What one matched reagent brought, and (when a `when` entry decided) which reagent decided it. */
function readingOf(m: ReagentMatch): ReagentReading {
	const reading: ReagentReading = { reagent: m.reagent, text: m.text, conditions: m.conditions };
	if (m.context) {
		reading.context = { reagent: m.context.reagent, why: m.context.why };
	}
	return reading;
}

function readTransformation(stepId: string, substrates: string[], product: string) {
	for (const [role, texts] of [
		['substrate', substrates],
		['product', [product]]
	] as const) {
		if (texts.length === 0 || texts.some((t) => !t.trim())) {
			throw new StepStructureError(stepId, role, 'it is empty.');
		}
	}
	try {
		return transformation(substrates, product);
	} catch (caught) {
		if (!isStructureError(caught)) {
			throw caught;
		}
		// Tell which side failed: the substrate texts are read first.
		const role = substrates.some((text) => failsToRead(text)) ? 'substrate' : 'product';
		throw new StepStructureError(stepId, role, caught.message, caught.code);
	}
}

function failsToRead(text: string): boolean {
	try {
		readStructure(text);
		return false;
	} catch {
		return true;
	}
}
