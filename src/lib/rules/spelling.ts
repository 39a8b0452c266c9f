/**
 * What kind of spelling a reagent spelling is. A formula keeps its case, because case carries
 * meaning there (CO is carbon monoxide, Co is cobalt; COCl2 is phosgene, CoCl2 a cobalt salt). A
 * bare metal ("Na", "zinc") names the metal only when it stands alone, never as the first word of a
 * salt ("sodium ascorbate") or the start of a formula ("Zn(BH4)2"). Names fold case freely.
 */
import { foldText } from './normalize';

const ELEMENT_SYMBOLS = new Set(
	(
		'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se ' +
		'Br Kr Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy ' +
		'Ho Er Tm Yb Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U Np Pu Am Cm Bk ' +
		'Cf Es Fm Md No Lr'
	).split(' ')
);

// Metals a chemist uses as the element (dissolving metals, metal/acid couples, Grignard and
// Barbier metals), by symbol and by name (common practice).
const METALS: Record<string, string[]> = {
	Li: ['lithium'],
	Na: ['sodium'],
	K: ['potassium'],
	Cs: ['caesium', 'cesium'],
	Mg: ['magnesium'],
	Ca: ['calcium'],
	Zn: ['zinc'],
	Fe: ['iron'],
	Sn: ['tin'],
	Cu: ['copper'],
	Ni: ['nickel'],
	Co: ['cobalt'],
	Al: ['aluminium', 'aluminum'],
	In: ['indium'],
	Sm: ['samarium'],
	Mn: ['manganese']
};
const METAL_NAMES = new Set(Object.values(METALS).flat());

/**
 * The spelling reduced to what identifies a formula: case kept, spaces dropped, every adduct dot
 * written `·`, e.g. `formulaKey('CeCl3 . 7H2O')` → `'CeCl3·7H2O'`.
 */
export function formulaKey(text: string): string {
	return foldText(text, true).replace(/\s+/g, '').replace(/[.*]/g, '·');
}

/** True when the text, as written, is a formula of element symbols, e.g. `'CoCl2'`, not `'LAH'`. */
export function readsAsFormula(text: string): boolean {
	const key = formulaKey(text);
	if (!/[A-Z]/.test(key)) {
		return false;
	}
	const tokens = key.match(/[A-Z][a-z]?|\d+|[()[\]·]|[^]/g) ?? [];
	return tokens.every((token) => /^(?:\d+|[()[\]·])$/.test(token) || ELEMENT_SYMBOLS.has(token));
}

/** True for a bare metal, by symbol (as written) or name, e.g. `'Na'`, `'zinc'`; not `'NaH'`. */
export function isBareMetal(spelling: string): boolean {
	const trimmed = spelling.trim();
	return Object.hasOwn(METALS, trimmed) || METAL_NAMES.has(trimmed.toLowerCase());
}

/**
 * Whether a loosely matched formula spelling may stand for what was typed: not when the typed
 * text is itself a different formula (`CoCl2` typed, `COCl2` listed). Lower case or odd case that
 * is no formula ("hcl", "nah") still matches.
 */
export function formulaFits(listed: string, typed: string): boolean {
	return formulaKey(typed) === formulaKey(listed) || !readsAsFormula(typed);
}

/** The key under which the loader checks that no two reagents claim one spelling. */
export function spellingKey(spelling: string, exactCase: boolean): string {
	const trimmed = spelling.trim();
	if (exactCase || readsAsFormula(trimmed)) {
		return `as written: ${formulaKey(trimmed)}`;
	}
	return foldText(trimmed).replace(/\s+/g, ' ');
}
