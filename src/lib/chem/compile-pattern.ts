// Compiling one recognition SMARTS into everything the searches need: openchemlib's query
// fragment, the atom roles from map numbers, the elements it cannot match without, and the loose
// (prefilter.ts) and exact (smarts-query.ts) TypeScript readings. Apart from patterns.ts, which
// validates whole rule files and calls this once per pattern.

import { Molecule, SmilesParser } from 'openchemlib';
import { looseQuery, type LooseQuery } from './prefilter';
import { exactQuery, type ExactQuery } from './smarts-query';
import { queryElements } from './smarts-plan';

/** A pattern ready for searching (match.ts): in TypeScript when `exact` is there, else with openchemlib. */
export type CompiledPattern = {
	smarts: string;
	fragment: Molecule;
	/**
	 * Atoms by role, as indices into the mappings findMatches returns: SMARTS order for the exact
	 * query, fragment order for openchemlib (which inserts the atoms of `!$()` exclusions).
	 */
	key: number;
	masked: number[];
	context: number[];
	/** Atomic numbers the pattern cannot match without: a cheap pre-check before searching. */
	requiredElements: number[];
	/** The same SMARTS as a loose TypeScript test (prefilter.ts), null when it cannot be read there. */
	loose: LooseQuery | null;
	/** The SMARTS as an exact TypeScript query (smarts-query.ts), null when only openchemlib reads it. */
	exact: ExactQuery | null;
};

export class RuleTableError extends Error {
	constructor(file: string, path: (string | number)[], reason: string) {
		super(
			`${file}${path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${p}`)).join('')}: ${reason}`
		);
		this.name = 'RuleTableError';
	}
}

const smartsParser = new SmilesParser({ smartsMode: 'smarts' });

/** Compiles one SMARTS for openchemlib, e.g. `compilePattern('[OX2H;A:1]c', 'groups.json', ['phenol'])`. */
export function compilePattern(
	smarts: string,
	file: string,
	path: (string | number)[]
): CompiledPattern {
	let fragment: Molecule;
	try {
		fragment = smartsParser.parseMolecule(smarts, { noCoordinates: true });
	} catch (caught) {
		throw new RuleTableError(
			file,
			path,
			`openchemlib cannot read the SMARTS ${smarts}: ${String(caught)}`
		);
	}
	fragment.setFragment(true);
	const fragmentMapNumbers = Array.from({ length: fragment.getAllAtoms() }, (_, atom) =>
		fragment.getAtomMapNo(atom)
	);
	const fragmentRoles = roles(fragmentMapNumbers);
	const exact = exactQuery(smarts);
	// Both readings must see the same roles; if not, openchemlib's reading is the one used.
	const exactRoles = exact && roles(exact.mapNumbers);
	const agree =
		exactRoles &&
		exactRoles.masked.length === fragmentRoles.masked.length &&
		exactRoles.context.length === fragmentRoles.context.length;
	const used = agree ? exactRoles : fragmentRoles;
	return {
		smarts,
		fragment,
		...used,
		requiredElements: requiredElements(smarts, file, path),
		loose: looseQuery(smarts),
		exact: agree ? exact : null
	};
}

/** Atoms by map number: `:1` masked (the first is the key), `:2` context. */
function roles(mapNumbers: number[]): { key: number; masked: number[]; context: number[] } {
	const masked: number[] = [];
	const context: number[] = [];
	mapNumbers.forEach((map, atom) => {
		if (map === 1) {
			masked.push(atom);
		} else if (map === 2) {
			context.push(atom);
		}
	});
	return { key: masked[0] ?? 0, masked, context };
}

/** The element of a pattern's key atom (null: not one element), whichever reading it was compiled with. */
export function keyElement(pattern: CompiledPattern): number | null {
	if (!pattern.exact) {
		return pattern.fragment.getAtomicNo(pattern.key);
	}
	const elements = queryElements(pattern.exact)[pattern.key];
	return elements?.length === 1 ? elements[0]! : null;
}

/** Elements named by plain (non-list, non-negated) atoms outside recursive `$()` parts. */
function requiredElements(smarts: string, file: string, path: (string | number)[]): number[] {
	const plain = stripRecursive(smarts);
	const fragment = smartsParser.parseMolecule(plain, { noCoordinates: true });
	const elements = new Set<number>();
	for (let atom = 0; atom < fragment.getAllAtoms(); atom++) {
		const list = fragment.getAtomList(atom);
		if (list && list.length > 0) {
			continue;
		}
		if (fragment.getAtomLabel(atom) === '') {
			continue;
		} // 'any atom' style queries
		elements.add(fragment.getAtomicNo(atom));
	}
	if (elements.size === 0) {
		throw new RuleTableError(file, path, `the SMARTS ${smarts} names no element`);
	}
	return [...elements];
}

function stripRecursive(smarts: string): string {
	let out = '';
	for (let i = 0; i < smarts.length; i++) {
		if (smarts.startsWith('$(', i)) {
			let depth = 0;
			let j = i + 1;
			for (; j < smarts.length; j++) {
				if (smarts[j] === '(') {
					depth++;
				} else if (smarts[j] === ')' && --depth === 0) {
					break;
				}
			}
			// Drop the primitive and the operator that joined it (`;!$(...)` or `&$(...)`).
			out = out.replace(/[;&,]?!?$/, '');
			i = j;
			continue;
		}
		out += smarts[i];
	}
	return out;
}
