// What zod cannot see in a rule override: whether the rule table knows the subject, whether the
// rating is one the subject can have, and whether the reagent belongs to the condition class. Pure,
// over a RuleTable, so the API, the page's form and tests share one judgement.

import { FREE_GROUP_IDS, PROTECTING_GROUP_IDS, type ConditionId } from '../rules/ids';
import type { Reagent } from '../rules/schemas';
import type { RuleTable } from '../rules/table-types';
import { GROUP_RATINGS, PG_RATINGS, type RuleOverrideBody } from './contract';

export type OverrideField = keyof RuleOverrideBody;
/** A refusal the API answers with 422 naming `field`, and the form shows under that field. */
export type OverrideProblem = { field: OverrideField; message: string };

export type SubjectKind = 'protecting-group' | 'free-group';

/** Which list the subject is in, e.g. `subjectKind('TBS') === 'protecting-group'`; null if neither. */
export function subjectKind(subject: string): SubjectKind | null {
	if ((PROTECTING_GROUP_IDS as readonly string[]).includes(subject)) {
		return 'protecting-group';
	}
	if ((FREE_GROUP_IDS as readonly string[]).includes(subject)) {
		return 'free-group';
	}
	return null;
}

/** The ratings a subject may take: stability for a PG, reactivity for a free group. */
export function ratingsFor(kind: SubjectKind): readonly string[] {
	return kind === 'protecting-group' ? PG_RATINGS : GROUP_RATINGS;
}

/** Every class a reagent can bring: its usual ones and those its `when` entries switch to. */
function classesOf(reagent: Reagent): ConditionId[] {
	return [
		...new Set([...reagent.conditions, ...(reagent.when ?? []).flatMap((w) => w.conditions)])
	];
}

/** Whether `inner` is `outer` or a finer class inside it (following `refines` upwards). */
function isWithin(table: RuleTable, inner: ConditionId, outer: ConditionId): boolean {
	const seen = new Set<ConditionId>();
	for (let id: ConditionId | undefined = inner; id && !seen.has(id);) {
		if (id === outer) {
			return true;
		}
		seen.add(id);
		id = table.conditions.find((c) => c.id === id)?.refines;
	}
	return false;
}

/**
 * The reagent row a name points at: its name or a synonym as written, else the one row whose name
 * or synonym matches ignoring case (an ambiguous spelling matches nothing).
 */
export function findReagent(table: RuleTable, name: string): Reagent | null {
	const exact = table.reagents.find((r) => r.name === name || r.synonyms.includes(name));
	if (exact) {
		return exact;
	}
	const folded = name.toLowerCase();
	const loose = table.reagents.filter((r) =>
		[r.name, ...r.synonyms].some((spelling) => spelling.toLowerCase() === folded)
	);
	return loose.length === 1 ? loose[0]! : null;
}

export type CheckedOverride =
	| { ok: true; override: RuleOverrideBody; kind: SubjectKind }
	| { ok: false; problem: OverrideProblem };

/**
 * Checks a zod-valid body against the table, e.g. `checkOverride(table, { subject: 'TBS',
 * condition: 'fluoride', reagent: 'TBAF', rating: 'labile', … })`. The answer's reagent is the
 * table's own name for it (a synonym such as "Bu4NF" is stored as "TBAF").
 */
export function checkOverride(table: RuleTable, body: RuleOverrideBody): CheckedOverride {
	const refuse = (field: OverrideField, message: string): CheckedOverride => ({
		ok: false,
		problem: { field, message }
	});
	const kind = subjectKind(body.subject);
	if (!kind) {
		return refuse(
			'subject',
			`“${body.subject}” is neither a protecting group nor a free group of the rule table.`
		);
	}
	const condition = table.conditions.find((c) => c.id === body.condition);
	if (!condition) {
		return refuse('condition', `“${body.condition}” is not a condition class of the rule table.`);
	}
	const allowed = ratingsFor(kind);
	if (!allowed.includes(body.rating)) {
		const what = kind === 'protecting-group' ? 'A protecting group' : 'A free group';
		return refuse(
			'rating',
			`${what} is rated ${allowed.join(', ')}; “${body.rating}” does not fit ${body.subject}.`
		);
	}
	if (body.reagent === undefined) {
		return { ok: true, override: body, kind };
	}
	const reagent = findReagent(table, body.reagent);
	if (!reagent) {
		return refuse(
			'reagent',
			`“${body.reagent}” is not a reagent of the rule table; name one from its list, or leave the reagent out to override the whole class.`
		);
	}
	const classes = classesOf(reagent);
	if (!classes.some((id) => isWithin(table, id, condition.id))) {
		const brings =
			classes.length > 0 ? `brings ${classes.join(', ')}` : 'brings no condition class';
		return refuse(
			'reagent',
			`${reagent.name} ${brings}, not ${condition.id} or a finer class of it; choose the class the reagent belongs to.`
		);
	}
	return { ok: true, override: { ...body, reagent: reagent.name }, kind };
}
