/**
 * Text folding shared by the reagent classifier: one output character per input UTF-16 unit, so
 * a match in the folded text points at the same span of what the chemist typed.
 */

const DASHES = new Set(['‐', '‑', '‒', '–', '—', '―', '−', '﹣', '－']);
const DOTS = new Set(['·', '•', '∙', '⋅', '・', '‧', '●']);
const QUOTES = new Set(['’', '‘', 'ʼ', '′', '`']);

function foldChar(ch: string, keepCase: boolean): string {
	if (DASHES.has(ch)) {
		return '-';
	}
	if (DOTS.has(ch)) {
		return '·';
	}
	if (QUOTES.has(ch)) {
		return "'";
	}
	if (/\s/.test(ch)) {
		return ' ';
	}
	// NFKC turns subscripts (₂ → 2), superscripts and full-width forms into plain characters.
	const compat = ch.normalize('NFKC');
	const plain = compat.length === 1 ? compat : ch;
	if (keepCase) {
		return plain;
	}
	const lower = plain.toLowerCase();
	return lower.length === 1 ? lower : plain;
}

/** Folds text for matching, keeping its length, e.g. `foldText('Et₃N•3HF')` → `'et3n·3hf'`. */
export function foldText(text: string, keepCase = false): string {
	let out = '';
	for (const ch of text.split('')) {
		out += foldChar(ch, keepCase);
	}
	return out;
}
