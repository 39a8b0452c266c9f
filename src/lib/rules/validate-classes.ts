/**
 * Cross-file checks on condition classes and ids: each fixed id defined once, finer classes one
 * level below a broader one, every broader class rated, `none` rows only for finer classes, and
 * each reactivity pair once. Split from validate.ts, which runs them, so each file stays one concern.
 */
import { formatIssue, RULE_FILES } from './issues';
import type { Condition, ProtectingGroupConditions, ReactivityEntry } from './schemas';

/** Reports ids of a fixed list that a file defines twice or not at all. */
export function checkEachOnce(
	file: string,
	what: string,
	expected: readonly string[],
	ids: readonly string[],
	problems: string[]
) {
	const firstIndex = new Map<string, number>();
	ids.forEach((id, index) => {
		if (firstIndex.has(id)) {
			problems.push(
				formatIssue(
					file,
					[index, 'id'],
					`duplicate ${what} "${id}" (first at [${firstIndex.get(id)}])`
				)
			);
		} else {
			firstIndex.set(id, index);
		}
	});
	const missing = expected.filter((id) => !firstIndex.has(id));
	if (missing.length > 0) {
		problems.push(
			formatIssue(file, [], `missing ${what}: ${missing.map((id) => `"${id}"`).join(', ')}`)
		);
	}
}

export function checkReactivityPairs(entries: readonly ReactivityEntry[], problems: string[]) {
	const seen = new Map<string, number>();
	entries.forEach((entry, index) => {
		const key = `${entry.group} × ${entry.condition}`;
		const first = seen.get(key);
		if (first !== undefined) {
			problems.push(
				formatIssue(RULE_FILES.reactivity, [index], `duplicate pair ${key} (first at [${first}])`)
			);
		} else {
			seen.set(key, index);
		}
	});
}

/** A finer class sits in a broader one, one level deep: `organometallic-grignard` → `organometallic`. */
export function checkRefinements(conditions: Condition[], problems: string[]) {
	const refines = new Map(conditions.map((c) => [c.id, c.refines]));
	conditions.forEach((condition, index) => {
		if (!condition.refines) {
			return;
		}
		const where = [index, 'refines'];
		if (condition.refines === condition.id) {
			problems.push(formatIssue(RULE_FILES.conditions, where, 'a class cannot refine itself'));
		} else if (refines.get(condition.refines)) {
			problems.push(
				formatIssue(
					RULE_FILES.conditions,
					where,
					`"${condition.refines}" is itself a finer class; refine its broader class "${refines.get(condition.refines)}"`
				)
			);
		}
	});
}

/** Every protecting group rates every broader class; finer classes inherit where they are not rated. */
export function checkBroadRatings(
	conditions: Condition[],
	pgs: ProtectingGroupConditions[],
	problems: string[]
) {
	const broad = conditions.filter((c) => !c.refines).map((c) => c.id);
	pgs.forEach((pg, index) => {
		for (const id of broad) {
			if (pg.stability[id] === undefined) {
				problems.push(
					formatIssue(
						RULE_FILES.protectingGroups,
						[index, 'stability', id],
						'missing rating (every broader condition class needs one: stable, caution or labile)'
					)
				);
			}
		}
	});
}

/** `none` only makes sense where a broader class's row could otherwise be inherited. */
export function checkNoneRows(
	conditions: Condition[],
	rows: ReactivityEntry[],
	problems: string[]
) {
	const finer = new Set(conditions.filter((c) => c.refines).map((c) => c.id));
	rows.forEach((row, index) => {
		if (row.rating === 'none' && !finer.has(row.condition)) {
			problems.push(
				formatIssue(
					RULE_FILES.reactivity,
					[index, 'rating'],
					`"none" is only for a finer class (${row.condition} refines nothing; leave the pair out instead)`
				)
			);
		}
	});
}
