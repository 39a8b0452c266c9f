/**
 * Reagent text → condition classes. Every reagent spelling is compiled once, at load, into
 * sticky regular expressions grouped by first character; classifying a step is one left-to-right
 * scan that takes the longest spelling starting at each word boundary (reagent-scan.ts). This
 * file turns the matches into the step's classes, heat, hazards and the fragments left unknown.
 */ import { CONDITION_IDS, type ConditionId } from './ids';
import { foldText } from './normalize';
import { WORD_CHAR, compileBuckets, scan, type Spelling } from './reagent-scan';
import { isNoiseFragment } from './reagent-text';
import { isBareMetal, readsAsFormula } from './spelling';
import type { Reagent } from './schemas';

/** The other reagent of the step whose tag picked a reagent's classes, and why it matters. */
export interface ReagentContextMatch {
	/** Canonical name of the reagent that carries the tag, e.g. `MeOH`. */
	reagent: string;
	/** Its span, as typed. */
	text: string;
	/** From the `when` entry, e.g. "carbonate in an alcohol: alkoxide forms and transesterifies esters". */
	why: string;
}

export interface ReagentMatch {
	/** Canonical reagent name from rules/reagents.json. */
	reagent: string;
	/** The span of the input that matched, as typed. */
	text: string;
	conditions: ConditionId[];
	/** Present when another reagent of the step decided the classes (a `when` entry). */
	context?: ReagentContextMatch;
}

export interface ReagentClassification {
	conditions: ConditionId[];
	matched: ReagentMatch[];
	hazards: { reagent: string; note: string }[];
	/** Fragments that named nothing the table knows (numbers, units and filler words are ignored). */
	unknown: string[];
}

/**
 * A reagent's classes in this step: the first `when` entry whose tag another matched reagent
 * carries, else the row's own `conditions` (the reagent's typical, harsher use).
 */
function inContext(
	reagent: Reagent,
	others: readonly { reagent: Reagent; text: string }[]
): Pick<ReagentMatch, 'conditions' | 'context'> {
	for (const entry of reagent.when ?? []) {
		const carrier = others.find(
			(o) => o.reagent !== reagent && o.reagent.tags?.includes(entry.tag)
		);
		if (carrier) {
			return {
				conditions: [...entry.conditions],
				context: { reagent: carrier.reagent.name, text: carrier.text, why: entry.why }
			};
		}
	}
	return { conditions: [...reagent.conditions] };
}

/** At or above this temperature a step counts as `heat` even without the word "reflux". */
export const HEAT_THRESHOLD_CELSIUS = 80;

const FRAGMENT_SPLIT = /[,;\n]|\bthen\b|\bfollowed by\b|\band\b/giu;
const TEMPERATURE = /(?<![\p{L}\p{N}.])([-+]?\d+(?:\.\d+)?)\s*°\s*c(?![\p{L}])/gu;

const EDGE_PUNCTUATION = /^[\s.:/+&~–-]+|[\s.:/+&~–-]+$/gu;
const PARTNER: Record<string, string> = { ')': '(', ']': '[', '}': '{' };

/**
 * An unrecognised fragment as the chemist should read it back: a bracketed amount dropped
 * ("OG-Cat 7 (5 mol%)" → "OG-Cat 7"), brackets without a partner dropped, and a name whose
 * brackets pair up kept whole ("(DHQD)2PHAL", not "DHQD)2PHAL").
 */
function trimFragment(fragment: string): string {
	const withoutAmounts = fragment.replace(/\(([^()]*)\)/gu, (whole, inner: string) =>
		isNoiseFragment(inner) ? ' ' : whole
	);
	return dropUnpairedBrackets(withoutAmounts).replace(EDGE_PUNCTUATION, '');
}

function dropUnpairedBrackets(text: string): string {
	const chars = [...text];
	const open: number[] = [];
	for (const [i, ch] of chars.entries()) {
		if ('([{'.includes(ch)) {
			open.push(i);
		} else if (ch in PARTNER) {
			const last = open.at(-1);
			if (last !== undefined && chars[last] === PARTNER[ch]) {
				open.pop();
			} else {
				chars[i] = '';
			}
		}
	}
	for (const i of open) {
		chars[i] = '';
	}
	return chars.join('');
}

/** Compiles the classifier, e.g. `compileClassifier(reagents)('TBAF, THF, 0 °C')`. */
export function compileClassifier(reagents: readonly Reagent[]) {
	const loose: Spelling[] = [];
	const exact: Spelling[] = [];
	for (const reagent of reagents) {
		const exactCase = new Set(reagent.exactCase ?? []);
		for (const spelling of [reagent.name, ...reagent.synonyms]) {
			const written = spelling.trim();
			const metal = isBareMetal(written);
			if (exactCase.has(written)) {
				exact.push({ folded: foldText(written, true), written, formula: false, metal, reagent });
				continue;
			}
			const formula = readsAsFormula(written);
			// A formula matches as written, and loosely ("hcl") unless typed as another formula.
			if (formula) {
				exact.push({ folded: foldText(written, true), written, formula: false, metal, reagent });
			}
			loose.push({ folded: foldText(written), written, formula, metal, reagent });
		}
	}
	// "cocl2" could be COCl2 or CoCl2: a folded spelling two reagents share matches only as written.
	const owners = new Map<string, Set<Reagent>>();
	for (const s of loose) {
		owners.set(s.folded, (owners.get(s.folded) ?? new Set()).add(s.reagent));
	}
	const looseBuckets = compileBuckets(loose.filter((s) => owners.get(s.folded)?.size === 1));
	const exactBuckets = compileBuckets(exact);

	return function conditionsForReagents(text: string): ReagentClassification {
		const folded = foldText(text);
		const cased = foldText(text, true);
		const taken = scan(folded, cased, looseBuckets, exactBuckets);

		const present = taken.map(({ start, end, spelling: { reagent } }) => ({
			reagent,
			text: text.slice(start, end)
		}));
		const matched: ReagentMatch[] = present.map(({ reagent, text: typed }) => ({
			reagent: reagent.name,
			text: typed,
			...inContext(reagent, present)
		}));
		const consumed = text.split('');
		for (const c of taken) {
			for (let i = c.start; i < c.end; i++) {
				consumed[i] = ' ';
			}
		}

		for (const m of folded.matchAll(TEMPERATURE)) {
			const start = m.index;
			const end = start + m[0].length;
			if (consumed.slice(start, end).join('').trim() === '') {
				continue;
			}
			if (Number(m[1]) >= HEAT_THRESHOLD_CELSIUS) {
				matched.push({ reagent: 'heat', text: text.slice(start, end), conditions: ['heat'] });
			}
			for (let i = start; i < end; i++) {
				consumed[i] = ' ';
			}
		}

		const rest = consumed.join('');
		const unknown = rest
			.split(FRAGMENT_SPLIT)
			.map((fragment) => trimFragment(fragment).replace(/\s+/g, ' '))
			.filter(
				(fragment) => fragment !== '' && WORD_CHAR.test(fragment) && !isNoiseFragment(fragment)
			);

		const found = new Set(matched.flatMap((m) => m.conditions));
		const hazards = new Map<string, string>();
		for (const { spelling } of taken) {
			if (spelling.reagent.hazard) {
				hazards.set(spelling.reagent.name, spelling.reagent.hazard);
			}
		}

		return {
			conditions: CONDITION_IDS.filter((id) => found.has(id)),
			matched,
			hazards: [...hazards].map(([reagent, note]) => ({ reagent, note })),
			unknown
		};
	};
}

export type ReagentClassifier = ReturnType<typeof compileClassifier>;
