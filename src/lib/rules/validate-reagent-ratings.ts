/**
 * Reagent-level ratings (a PG row's `reagentRatings`, a reactivity row's `reagentRatings`) must
 * name a reagent of rules/reagents.json that brings the class they refine, or the rating could
 * never apply: a typo, or a reagent that reads as another class.
 */
import { formatIssue, RULE_FILES } from './issues';
import type { Condition, ProtectingGroupConditions, ReactivityEntry, Reagent } from './schemas';

/** Every class a reagent can bring: its own and those of its `when` contexts. */
function classesOf(reagent: Reagent): string[] {
	return [...reagent.conditions, ...(reagent.when ?? []).flatMap((entry) => entry.conditions)];
}

function reagentProblem(
	file: string,
	where: PropertyKey[],
	name: string,
	reagent: Reagent | undefined,
	accepts: (classes: string[]) => boolean,
	condition: string
): string | undefined {
	if (!reagent) {
		return formatIssue(
			file,
			where,
			`unknown reagent "${name}" (not a name in ${RULE_FILES.reagents})`
		);
	}
	if (!accepts(classesOf(reagent))) {
		return formatIssue(
			file,
			where,
			`"${name}" does not bring ${condition} in ${RULE_FILES.reagents}`
		);
	}
	return undefined;
}

/** A PG's reagent rating names a reagent that brings exactly the class it refines. */
export function checkReagentRatings(
	pgs: ProtectingGroupConditions[],
	reagents: Reagent[],
	problems: string[]
) {
	const byName = new Map(reagents.map((r) => [r.name, r]));
	pgs.forEach((pg, index) => {
		pg.reagentRatings.forEach((entry, i) => {
			const where = [index, 'reagentRatings', i, 'reagent'];
			const problem = reagentProblem(
				RULE_FILES.protectingGroups,
				where,
				entry.reagent,
				byName.get(entry.reagent),
				(classes) => classes.includes(entry.condition),
				entry.condition
			);
			if (problem) {
				problems.push(problem);
			}
		});
	});
}

/**
 * A reactivity row's reagent rating names a reagent that brings the row's class or a finer class
 * inside it (the row is inherited there): TBHP brings `oxidant-strong-alkene` for an alkene row.
 */
export function checkReactivityReagentRatings(
	rows: ReactivityEntry[],
	reagents: Reagent[],
	conditions: Condition[],
	problems: string[]
) {
	const byName = new Map(reagents.map((r) => [r.name, r]));
	rows.forEach((row, index) => {
		const covered: string[] = [
			row.condition,
			...conditions.filter((c) => c.refines === row.condition).map((c) => c.id)
		];
		row.reagentRatings.forEach((entry, i) => {
			const where = [index, 'reagentRatings', i, 'reagent'];
			const problem = reagentProblem(
				RULE_FILES.reactivity,
				where,
				entry.reagent,
				byName.get(entry.reagent),
				(classes) => classes.some((c) => covered.includes(c)),
				row.condition
			);
			if (problem) {
				problems.push(problem);
			}
		});
	});
}
