// Finding reagent spellings in typed text for the classifier (classify.ts): every spelling is
// compiled once into sticky regular expressions grouped by first character, and a scan takes the
// longest spelling starting at each word boundary. Apart from the classifier so that how text is
// matched (this file) and what a match means for the step (classify.ts) can be read on their own.

import { standsAlone } from './reagent-text';
import { formulaFits } from './spelling';
import type { Reagent } from './schemas';

export const WORD_CHAR = /[\p{L}\p{N}]/u;
const BOUNDARY_AFTER = '(?![\\p{L}\\p{N}])';

export interface Spelling {
	folded: string;
	/** As listed in rules/reagents.json. */
	written: string;
	/** A formula matched loosely fits only typed text that is not another formula. */
	formula: boolean;
	/** A bare metal counts only where it stands alone (see reagent-text.ts). */
	metal: boolean;
	reagent: Reagent;
}

export interface Candidate {
	start: number;
	end: number;
	spelling: Spelling;
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
			while (i < folded.length && /[\s,;/·]/.test(folded[i] as string)) {
				run += folded[i++];
			}
			if (/[,;/]/.test(run)) {
				out += '\\s*[,;/]\\s*';
			}
			// An adduct is written with a dot, dash or slash: "HF·py", "HF-py" and "HF/py" are one reagent.
			else if (run.includes('·')) {
				out += '(?:\\s*[·.*/-]\\s*|\\s+)';
			} else {
				out += '\\s+';
			}
			continue;
		}
		out += ch === '-' ? '[-\\s]' : escapeRegExp(ch);
		i++;
	}
	return out;
}

export interface Bucket {
	regex: RegExp;
	owners: Spelling[];
}

/**
 * Spellings grouped by first character, each group one sticky regex (longest spelling first),
 * so a scan tries only the few spellings that can start where it stands.
 */
export function compileBuckets(spellings: Spelling[]): Map<string, Bucket> {
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
			owners: group
		});
	}
	return buckets;
}

/** The longest spelling in `buckets` that starts exactly at `at`, if any. */
function matchAt(buckets: Map<string, Bucket>, text: string, at: number): Candidate | undefined {
	const bucket = buckets.get(text[at] as string);
	if (!bucket) {
		return undefined;
	}
	bucket.regex.lastIndex = at;
	const m = bucket.regex.exec(text);
	if (!m) {
		return undefined;
	}
	const group = m.findIndex((g, i) => i > 0 && g !== undefined);
	const spelling = bucket.owners[group - 1];
	return spelling && { start: at, end: at + m[0].length, spelling };
}

/** Whether a match may stand for what was typed: formula case and metal context (see spelling.ts). */
function fits(candidate: Candidate | undefined, cased: string): Candidate | undefined {
	if (!candidate) {
		return undefined;
	}
	const { start, end, spelling } = candidate;
	if (spelling.formula && !formulaFits(spelling.written, cased.slice(start, end))) {
		return undefined;
	}
	if (spelling.metal && !standsAlone(cased, start, end)) {
		return undefined;
	}
	return candidate;
}

/** A word starts here, and not inside a formula's brackets: "CO" in "Co2(CO)8" starts nothing. */
function startsWord(text: string, at: number): boolean {
	if (at === 0) {
		return true;
	}
	const previous = text[at - 1] as string;
	if (WORD_CHAR.test(previous)) {
		return false;
	}
	return !(/[([]/.test(previous) && at >= 2 && /[\p{L}\p{N})\]]/u.test(text[at - 2] as string));
}

/** Leftmost-longest matches over the text, tried only where a word can begin. */
export function scan(
	folded: string,
	cased: string,
	loose: Map<string, Bucket>,
	exact: Map<string, Bucket>
): Candidate[] {
	const taken: Candidate[] = [];
	let at = 0;
	while (at < folded.length) {
		if (folded[at] !== ' ' && startsWord(folded, at)) {
			const a = fits(matchAt(loose, folded, at), cased);
			const b = fits(matchAt(exact, cased, at), cased);
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
