/**
 * Reagent text that carries no chemistry of its own (amounts, units, times, filler words), and the
 * test for a bare metal standing alone: "Na, NH3" and "Zn (10 equiv), HCl" name the metal, while
 * "sodium ascorbate", "diethyl zinc" and "Zn(BH4)2" name compounds of it.
 */

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

// How a chemist says which form of a metal is used; beside a bare metal these keep it a metal.
const METAL_FORMS = new Set(
	(
		'dust powder powdered turnings wire sand shot foil granules granular pieces chips ribbon metal ' +
		'activated mossy amalgamated cut clean'
	).split(' ')
);

const CONTEXT_SPLIT = /[,;/+\n]|\bthen\b|\band\b|\bfollowed by\b/iu;

/** True when every word of the fragment is an amount, unit or filler word, e.g. `'(1.1 equiv)'`. */
export function isFillerFragment(fragment: string, extra?: ReadonlySet<string>): boolean {
	const words = fragment.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
	return words.every(
		(word) =>
			/^\d+$/.test(word) ||
			FILLER.has(word) ||
			extra?.has(word) === true ||
			/^\d+(h|min|mm|ml|mg|g|mol|equiv|eq|atm|bar|psi|k|c)$/.test(word)
	);
}

/** True when a leftover fragment says nothing a chemist needs checked, e.g. `'(2 equiv), dust'`. */
export function isNoiseFragment(fragment: string): boolean {
	return isFillerFragment(fragment, METAL_FORMS);
}

/**
 * True when the span `text[start, end)` stands alone in its part of the step: nothing but amounts,
 * filler and words for a metal's form before or after it up to the next comma, slash or "then",
 * e.g. `standsAlone('Na, NH3', 0, 2)` but not `standsAlone('sodium ascorbate', 0, 6)`.
 */
export function standsAlone(text: string, start: number, end: number): boolean {
	const before = text.slice(0, start).split(CONTEXT_SPLIT).pop() ?? '';
	const after = text.slice(end).split(CONTEXT_SPLIT)[0] ?? '';
	if (/^[([]/.test(after)) {
		return false;
	} // "Zn(BH4)2": a formula goes on
	return isFillerFragment(before, METAL_FORMS) && isFillerFragment(after, METAL_FORMS);
}
