/**
 * Cross-file checks on reagents: no spelling claimed by two reagents, and every `when` tag carried
 * by some reagent. Split from validate.ts, which runs them, so each file stays one concern.
 */
import { formatIssue, RULE_FILES } from './issues';
import { spellingKey } from './spelling';
import type { Reagent } from './schemas';

export function checkReagentSpellings(reagents: readonly Reagent[], problems: string[]) {
	const owner = new Map<string, string>();
	reagents.forEach((reagent, index) => {
		const exactCase = new Set(reagent.exactCase ?? []);
		const spellings: [string, PropertyKey[]][] = [
			[reagent.name, [index, 'name']],
			...reagent.synonyms.map((s, i): [string, PropertyKey[]] => [s, [index, 'synonyms', i]])
		];
		for (const [spelling, path] of spellings) {
			// Formulas keep their case (CoCl2 is not COCl2); names fold.
			const key = spellingKey(spelling, exactCase.has(spelling.trim()));
			const previous = owner.get(key);
			if (previous !== undefined && previous !== reagent.name) {
				problems.push(
					formatIssue(
						RULE_FILES.reagents,
						path,
						`"${spelling}" is already a spelling of "${previous}"`
					)
				);
			} else {
				owner.set(key, reagent.name);
			}
		}
	});
}

/** A `when` tag that no reagent carries could never apply: a typo, or a tag not yet given out. */
export function checkContextTags(reagents: readonly Reagent[], problems: string[]) {
	const carried = new Set(reagents.flatMap((r) => r.tags ?? []));
	reagents.forEach((reagent, index) => {
		(reagent.when ?? []).forEach((entry, i) => {
			if (!carried.has(entry.tag)) {
				problems.push(
					formatIssue(
						RULE_FILES.reagents,
						[index, 'when', i, 'tag'],
						`no reagent carries the tag "${entry.tag}", so this context never applies`
					)
				);
			}
		});
	});
}
