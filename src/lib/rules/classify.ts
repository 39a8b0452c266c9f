/**
 * Reagent text → condition classes. Every reagent spelling is compiled once, at load, into
 * sticky regular expressions grouped by first character; classifying a step is one left-to-right
 * scan that takes the longest spelling starting at each word boundary.
 */
import { CONDITION_IDS, type ConditionId } from './ids';
import { foldText } from './normalize';
import type { Reagent } from './schemas';

export interface ReagentMatch {
	/** Canonical reagent name from rules/reagents.json. */
	reagent: string;
	/** The span of the input that matched, as typed. */
	text: string;
	conditions: ConditionId[];
}

export interface ReagentClassification {
	conditions: ConditionId[];
	matched: ReagentMatch[];
	hazards: { reagent: string; note: string }[];
	/** Fragments that named nothing the table knows (numbers, units and filler words are ignored). */
	unknown: string[];
}

/** At or above this temperature a step counts as `heat` even without the word "reflux". */
export const HEAT_THRESHOLD_CELSIUS = 80;

const WORD_CHAR = /[\p{L}\p{N}]/u;
const BOUNDARY_AFTER = '(?![\\p{L}\\p{N}])';

// Words that carry no chemistry of their own in reagent text: units, times, atmospheres, filler.
const FILLER = new Set(
	(
		'rt r t room temp temperature ambient then and in with at over overnight followed by to from for under via of on ' +
		'or neat step steps i ii iii iv v vi vii viii ix x a b c d e cat catalytic equiv eq equivalent equivalents mol ' +
		'mmol µmol umol m mm n h hr hrs hour hours min mins minute minutes s sec day days week weeks k atm bar psi ml µl ' +
		'ul l g mg kg ppm vol wt w excess dry dried anhydrous aq aqueous sat satd saturated conc concentrated dilute ' +
		'solution soln mixture work workup up quench quenched ar argon n2 nitrogen atmosphere inert degassed slow ' +
		'slowly dropwise addition added add stir stirred stirring cool cooled cold warm warmed warming ice bath one pot ' +
		'same ca approx about fresh freshly distilled sequential sequentially portionwise portions batch ' +
		'the an reagent reagents conditions cond mild rxn reaction'
	).split(' ')
);
const FRAGMENT_SPLIT = /[,;\n]|\bthen\b|\bfollowed by\b|\band\b/giu;
const TEMPERATURE = /(?<![\p{L}\p{N}.])([-+]?\d+(?:\.\d+)?)\s*°\s*c(?![\p{L}])/gu;

interface Spelling {
	folded: string;
	reagent: Reagent;
}

interface Candidate {
	start: number;
	end: number;
	reagent: Reagent;
}

function escapeRegExp(text: string): string {
	return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** Pattern for one folded spelling: spacing, separators, dots and dashes are matched loosely. */
function spellingPattern(folded: string): string {
	let out = '';
	let i = 0;
	while (i < folded.length) {
		const ch = folded[i] as string;
		if (/[\s,;/·]/.test(ch)) {
			let run = '';
			while (i < folded.length && /[\s,;/·]/.test(folded[i] as string)) run += folded[i++];
			if (/[,;/]/.test(run)) out += '\\s*[,;/]\\s*';
			else if (run.includes('·')) out += '(?:\\s*[·.*]\\s*|\\s+)';
			else out += '\\s+';
			continue;
		}
		out += ch === '-' ? '[-\\s]' : escapeRegExp(ch);
		i++;
	}
	return out;
}

interface Bucket {
	regex: RegExp;
	owners: Reagent[];
}

/**
 * Spellings grouped by first character, each group one sticky regex (longest spelling first),
 * so a scan tries only the few spellings that can start where it stands.
 */
function compileBuckets(spellings: Spelling[]): Map<string, Bucket> {
	const byFirst = new Map<string, Spelling[]>();
	for (const spelling of new Map(spellings.map((s) => [s.folded, s])).values()) {
		const first = spelling.folded[0] as string;
		byFirst.set(first, [...(byFirst.get(first) ?? []), spelling]);
	}
	const buckets = new Map<string, Bucket>();
	for (const [first, group] of byFirst) {
		group.sort((a, b) => b.folded.length - a.folded.length || a.folded.localeCompare(b.folded));
		const body = group.map((s) => `(${spellingPattern(s.folded)})`).join('|');
		buckets.set(first, {
			regex: new RegExp(`(?:${body})${BOUNDARY_AFTER}`, 'uy'),
			owners: group.map((s) => s.reagent)
		});
	}
	return buckets;
}

/** The longest spelling in `buckets` that starts exactly at `at`, if any. */
function matchAt(buckets: Map<string, Bucket>, text: string, at: number): Candidate | undefined {
	const bucket = buckets.get(text[at] as string);
	if (!bucket) return undefined;
	bucket.regex.lastIndex = at;
	const m = bucket.regex.exec(text);
	if (!m) return undefined;
	const group = m.findIndex((g, i) => i > 0 && g !== undefined);
	const reagent = bucket.owners[group - 1];
	return reagent && { start: at, end: at + m[0].length, reagent };
}

/** Leftmost-longest matches over the text, tried only where a word can begin. */
function scan(
	folded: string,
	cased: string,
	loose: Map<string, Bucket>,
	exact: Map<string, Bucket>
): Candidate[] {
	const taken: Candidate[] = [];
	let at = 0;
	while (at < folded.length) {
		const startsWord = at === 0 || !WORD_CHAR.test(folded[at - 1] as string);
		if (startsWord && folded[at] !== ' ') {
			const a = matchAt(loose, folded, at);
			const b = matchAt(exact, cased, at);
			const best = a && b ? (b.end > a.end ? b : a) : (a ?? b);
			if (best) {
				taken.push(best);
				at = best.end;
				continue;
			}
		}
		at++;
	}
	return taken;
}

function isFillerFragment(fragment: string): boolean {
	const words = fragment.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
	return words.every(
		(word) =>
			/^\d+$/.test(word) ||
			FILLER.has(word) ||
			/^\d+(h|min|mm|ml|mg|g|mol|equiv|eq|atm|bar|psi|k|c)$/.test(word)
	);
}

function trimFragment(fragment: string): string {
	return fragment.replace(/^[\s()[\]{}.:/+&~–-]+|[\s()[\]{}.:/+&~–-]+$/gu, '');
}

/** Compiles the classifier, e.g. `compileClassifier(reagents)('TBAF, THF, 0 °C')`. */
export function compileClassifier(reagents: readonly Reagent[]) {
	const loose: Spelling[] = [];
	const exact: Spelling[] = [];
	for (const reagent of reagents) {
		const exactCase = new Set(reagent.exactCase ?? []);
		for (const spelling of [reagent.name, ...reagent.synonyms]) {
			const trimmed = spelling.trim();
			if (exactCase.has(trimmed)) exact.push({ folded: foldText(trimmed, true), reagent });
			else loose.push({ folded: foldText(trimmed), reagent });
		}
	}
	const looseBuckets = compileBuckets(loose);
	const exactBuckets = compileBuckets(exact);

	return function conditionsForReagents(text: string): ReagentClassification {
		const folded = foldText(text);
		const cased = foldText(text, true);
		const taken = scan(folded, cased, looseBuckets, exactBuckets);

		const matched: ReagentMatch[] = taken.map((c) => ({
			reagent: c.reagent.name,
			text: text.slice(c.start, c.end),
			conditions: [...c.reagent.conditions]
		}));
		const consumed = text.split('');
		for (const c of taken) for (let i = c.start; i < c.end; i++) consumed[i] = ' ';

		for (const m of folded.matchAll(TEMPERATURE)) {
			const start = m.index;
			const end = start + m[0].length;
			if (consumed.slice(start, end).join('').trim() === '') continue;
			if (Number(m[1]) >= HEAT_THRESHOLD_CELSIUS) {
				matched.push({ reagent: 'heat', text: text.slice(start, end), conditions: ['heat'] });
			}
			for (let i = start; i < end; i++) consumed[i] = ' ';
		}

		const rest = consumed.join('');
		const unknown = rest
			.split(FRAGMENT_SPLIT)
			.map((fragment) => trimFragment(fragment).replace(/\s+/g, ' '))
			.filter(
				(fragment) => fragment !== '' && WORD_CHAR.test(fragment) && !isFillerFragment(fragment)
			);

		const found = new Set(matched.flatMap((m) => m.conditions));
		const hazards = new Map<string, string>();
		for (const c of taken) if (c.reagent.hazard) hazards.set(c.reagent.name, c.reagent.hazard);

		return {
			conditions: CONDITION_IDS.filter((id) => found.has(id)),
			matched,
			hazards: [...hazards].map(([reagent, note]) => ({ reagent, note })),
			unknown
		};
	};
}

export type ReagentClassifier = ReturnType<typeof compileClassifier>;
