// The regression corpus of literature steps (tests/corpus/steps/*.json): its format, its loader
// and how a check answer is read against a step's expectations. README.md beside this file says
// what a step means and how to add one.

import { readdirSync, readFileSync } from 'node:fs';
import { z } from 'zod';
import type { Clash } from '../../src/lib/rules/check';

/** What the check must say about one subject that stands by (survives into the product). */
export const OUTCOMES = ['clash', 'caution', 'quiet', 'not-clash'] as const;
export type Outcome = (typeof OUTCOMES)[number];
/** What the check did say: the harshest severity reported on the subject, or nothing. */
export type Verdict = 'clash' | 'caution' | 'quiet';

/**
 * The patterns of issue 11 ("What is wrong today"); every one must have steps. `reagent-reading`:
 * salts and formulas that must not be read as a metal or another reagent (sodium ascorbate, CoCl2).
 */
export const TOPICS = [
	'aryl-halide',
	'metal-reduction',
	'oxidant',
	'acid',
	'acylation',
	'base',
	'hydrogenation',
	'hydride',
	'fluoride',
	'organometallic',
	'lewis-acid',
	'perception',
	'protecting-group',
	'reagent-reading',
	'unrecognized'
] as const;

const smiles = z.string().min(1);
const stepSchema = z
	.object({
		id: z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/),
		topic: z.enum(TOPICS),
		/** As the paper or book writes them. */
		reagents: z.string().min(1),
		/** One SMILES, or several for a convergent step (atom indices follow the order given). */
		substrate: z.union([smiles, z.array(smiles).min(2)]),
		product: smiles,
		expect: z.array(z.object({ subject: z.string().min(1), outcome: z.enum(OUTCOMES) })).min(1),
		/** Reagent text the check must report as not recognised (each must appear in one entry). */
		unrecognized: z.array(z.string().min(1)).min(1).optional(),
		/** Group ids that perception must NOT report in the substrate (a methylenedioxy arene is no acetal). */
		absent: z.array(z.string().min(1)).min(1).optional(),
		/** "real compound(s) …" or "simplified analogue …" of the literature substrate. */
		structures: z.string().min(1),
		/** Book + chapter, paper (authors, journal, year, volume, page), "common practice", "— from memory". */
		source: z.string().min(10),
		/**
		 * Where the table's answer is deliberately looser than the paper's strict reading (a caution
		 * where the paper's case needs none), why: the limit of the model, said in the open.
		 */
		judgement: z.string().min(20).optional()
	})
	.strict();
export type CorpusStep = z.output<typeof stepSchema>;

const stepsFolder = new URL('./steps/', import.meta.url);

/** Every step of every topic file, in file order, e.g. `{ id: 'grignard-beside-arf', … }`. */
export function loadCorpus(): CorpusStep[] {
	return readdirSync(stepsFolder)
		.filter((name) => name.endsWith('.json'))
		.sort()
		.flatMap((name) => {
			const raw: unknown = JSON.parse(readFileSync(new URL(name, stepsFolder), 'utf8'));
			const parsed = z.array(stepSchema).safeParse(raw);
			if (!parsed.success) {
				throw new Error(`tests/corpus/steps/${name}: ${parsed.error.message}`);
			}
			return parsed.data;
		});
}

/**
 * RDKit SMARTS for subjects the rule files do not define yet (ids fixed by the issue 11 contract,
 * built on other branches). The rule files win wherever they define an id.
 */
export const fallbackSmarts: Record<string, string[]> = z
	.record(z.string(), z.array(z.string().min(1)).min(1))
	.parse(JSON.parse(readFileSync(new URL('./subject-smarts.json', import.meta.url), 'utf8')));

/** A step's substrate texts as a list. */
export const substrates = (step: CorpusStep): string[] =>
	Array.isArray(step.substrate) ? step.substrate : [step.substrate];

/** Routine steps expect nothing flagged as a clash; the others are true clashes. */
export const isTrueClash = (step: CorpusStep): boolean =>
	step.expect.some((e) => e.outcome === 'clash');

/** The harshest severity the check reported on a subject, e.g. `caution`. */
export function verdictOn(clashes: readonly Clash[], subject: string): Verdict {
	const severities = clashes.filter((c) => c.subject === subject).map((c) => c.severity);
	if (severities.includes('clash')) {
		return 'clash';
	}
	return severities.includes('caution') ? 'caution' : 'quiet';
}

/** Whether a verdict meets an expectation (`not-clash` accepts a caution). */
export function meets(outcome: Outcome, verdict: Verdict): boolean {
	return outcome === 'not-clash' ? verdict !== 'clash' : outcome === verdict;
}
