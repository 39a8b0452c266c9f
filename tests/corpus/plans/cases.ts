// The planner case corpus of issue 12 (tests/corpus/plans/*.json): textbook situations, each with
// the first choice an experienced chemist makes, what must never be offered, and the source.
// tests/unit/plan-cases.test.ts runs them; README.md beside this file says how to add one.

import { readdirSync, readFileSync } from 'node:fs';
import { z } from 'zod';
import { FREE_GROUP_IDS, PROTECTING_GROUP_IDS } from '../../../src/lib/rules/ids';

const groupId = z.enum(FREE_GROUP_IDS);
const pgId = z.enum(PROTECTING_GROUP_IDS);
/** A regular expression as text; the schema refuses one that does not compile. */
const pattern = z.string().refine((text) => {
	try {
		new RegExp(text);
		return true;
	} catch {
		return false;
	}
}, 'not a valid regular expression');

export const planExpectSchema = z
	.object({
		/** Per group, the PG plan 1 puts on it (or any of a list): every such protection in plan 1. */
		firstChoice: z.partialRecord(groupId, z.union([pgId, z.array(pgId).min(2)])).optional(),
		/** Groups plan 1 must mask (a caution-level need counts: the chemist masks it). */
		masks: z.array(groupId).min(1).optional(),
		/** The route needs no protection: plan 1 adds nothing and the answer is not unsolved. */
		nothingToMask: z.literal(true).optional(),
		/** PGs no offered plan may use (they cannot survive, or cannot be put on here). */
		never: z.array(pgId).min(1).optional(),
		/** PGs plan 1 must not use (possible, but not what a chemist reaches for first). */
		neverFirst: z.array(pgId).min(1).optional(),
		/** No plan exists: the answer is `unsolved`. */
		unsolved: z.literal(true).optional(),
		/** Plan 1's rationale (its lines joined by a space) matches this regular expression. */
		rationaleMatches: pattern.optional(),
		/**
		 * Per PG, how every offered plan that uses it must put it on: its install reagents match
		 * `matches` and not `not`, e.g. Bn beside an ester by the imidate, never NaH.
		 */
		installs: z
			.partialRecord(pgId, z.object({ matches: pattern.optional(), not: pattern.optional() }))
			.optional()
	})
	.strict()
	.refine((e) => Object.keys(e).length > 0, 'a case must expect something')
	.refine(
		(e) => !(e.unsolved && (e.firstChoice || e.masks || e.nothingToMask)),
		'an unsolved case has no plan 1'
	)
	.refine(
		(e) => !(e.nothingToMask && (e.firstChoice || e.masks)),
		'nothing to mask, yet masks expected'
	);
export type PlanExpect = z.output<typeof planExpectSchema>;

export const planCaseSchema = z
	.object({
		id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/),
		title: z.string().min(10),
		/** A linear route as `line()` builds it: structures i0…in, reagents of steps s1…sn. */
		route: z
			.object({
				structures: z.array(z.string().min(1)).min(2),
				reagents: z.array(z.string().min(1)).min(1)
			})
			.strict()
			.refine(
				(r) => r.structures.length === r.reagents.length + 1,
				'one more structure than steps'
			),
		expect: planExpectSchema,
		/** Book and section, paper (authors, journal, year, volume, page), "common practice", "— from memory". */
		source: z.string().min(10),
		/** The chemistry behind the expectation, in a sentence or two. */
		why: z.string().min(20)
	})
	.strict();
export type PlanCase = z.output<typeof planCaseSchema>;
/** A case as loaded, with the theme file it came from. */
export type LoadedCase = PlanCase & { file: string };

const folder = new URL('./', import.meta.url);

/** Every case of every theme file, in file order, e.g. `{ id: 'primary-oh-beside-ketone-grignard', … }`. */
export function loadPlanCases(): LoadedCase[] {
	return readdirSync(folder)
		.filter((name) => name.endsWith('.json'))
		.sort()
		.flatMap((name) => {
			const raw: unknown = JSON.parse(readFileSync(new URL(name, folder), 'utf8'));
			const parsed = z.array(planCaseSchema).safeParse(raw);
			if (!parsed.success) {
				throw new Error(`tests/corpus/plans/${name}: ${parsed.error.message}`);
			}
			return parsed.data.map((c) => ({ ...c, file: name }));
		});
}

/** The group ids a case names, which perception must find somewhere on the route. */
export function namedGroups(expect: PlanExpect): string[] {
	return [...new Set([...Object.keys(expect.firstChoice ?? {}), ...(expect.masks ?? [])])];
}
