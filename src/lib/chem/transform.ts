// Runs reaction SMARTS on chosen atoms of a molecule with openchemlib's Reactor.
//
// A Reactor makes one product per match of the reactant pattern anywhere in the molecule; the
// planner wants one product, changed only where it chose. So each chosen site gets a marker
// isotope on the atoms its pattern maps, the pattern's mapped atoms require that isotope, and all
// of an intermediate's transforms run as ONE reaction (the patterns as disconnected parts of one
// reactant, each with its own marker): one Reactor run, one coordinate invention, per structure.
// The Reactor keeps stereo and the untouched atoms as they were.

import { Molecule, Reactor, SmilesParser, SSSearcher, type Reaction } from 'openchemlib';
import { LruCache } from './cache';

/** One transform at one site, e.g. `{ smarts: '[O;H1:1]>>[O:1]C', atoms: [4, 5] }`; `atoms` holds the site. */
export type SiteTransform = { smarts: string; atoms: readonly number[] };

export class TransformError extends Error {}

// Far outside real isotopes, so a marked atom is never a labelled one by chance.
const MARKER = 900;

type Compiled = { reactant: Molecule; mapped: number[]; maxMapNo: number; parts: [string, string] };

const smartsParser = new SmilesParser({ smartsMode: 'smarts', createSmartsWarnings: true });
const compiledCache = new Map<string, Compiled>();
// A Reaction is an openchemlib object (no JSON); the SMARTS of a PG install are small.
const reactionCache = new LruCache<Reaction>('combinedReactions', undefined, () => 16 * 1024);

/** Parses one reaction SMARTS and checks its shape, e.g. `compileTransform('[C:1]=O>>[C:1]1OCCO1')`. */
export function compileTransform(smarts: string): Compiled {
	const stored = compiledCache.get(smarts);
	if (stored) {
		return stored;
	}
	const parts = smarts.split('>>');
	if (parts.length !== 2) {
		throw new TransformError(`"${smarts}" is not one reaction SMARTS ("reactant>>product").`);
	}
	let reaction: Reaction;
	try {
		reaction = smartsParser.parseReaction(smarts);
	} catch (caught) {
		throw new TransformError(
			`"${smarts}" cannot be read: ${String((caught as Error).message ?? caught)}`
		);
	}
	const warning = smartsParser.getSmartsWarning();
	if (warning) {
		throw new TransformError(`"${smarts}" uses SMARTS that openchemlib ignores: ${warning}`);
	}
	if (reaction.getReactants() !== 1 || reaction.getProducts() !== 1) {
		throw new TransformError(`"${smarts}" must have one reactant and one product.`);
	}
	const reactant = reaction.getReactant(0);
	reactant.setFragment(true);
	const mapped: number[] = [];
	let maxMapNo = 0;
	for (let atom = 0; atom < reactant.getAllAtoms(); atom++) {
		const mapNo = reactant.getAtomMapNo(atom);
		if (mapNo) {
			mapped.push(atom);
		}
		maxMapNo = Math.max(maxMapNo, mapNo);
	}
	if (mapped.length === 0) {
		throw new TransformError(
			`"${smarts}" maps no atom: nothing would say where the change happens.`
		);
	}
	const compiled: Compiled = { reactant, mapped, maxMapNo, parts: parts as [string, string] };
	compiledCache.set(smarts, compiled);
	return compiled;
}

/**
 * The molecule with every transform applied at its own site, as a new molecule, e.g. TBS on the
 * secondary alcohol of `OCCC(O)C` only: `applyTransforms(m, [{ smarts: '[O;H1:1]>>[O:1][Si](C)(C)C(C)(C)C', atoms: [4] }])`.
 * Throws TransformError when a transform finds no site among its atoms.
 */
export function applyTransforms(
	molecule: Molecule,
	transforms: readonly SiteTransform[]
): Molecule {
	if (transforms.length === 0) {
		return molecule.getCompactCopy();
	}
	const copy = molecule.getCompactCopy();
	copy.ensureHelperArrays(Molecule.cHelperRings);
	const originalMass = new Map<number, number>();
	transforms.forEach((transform, index) => {
		for (const atom of siteOf(copy, transform)) {
			if (originalMass.has(atom)) {
				throw new TransformError(`Two transforms claim atom ${atom}.`);
			}
			originalMass.set(atom, copy.getAtomMass(atom));
			copy.setAtomMass(atom, MARKER + index);
			// The label survives the Reactor and says which atom to give its own isotope back.
			copy.setAtomCustomLabel(atom, `]${atom}`);
		}
	});
	const reactor = new Reactor(combinedReaction(transforms.map((t) => t.smarts)));
	reactor.setReactant(0, copy);
	const product = reactor.getProducts()[0]?.[0];
	if (!product) {
		throw new TransformError('The transforms did not apply together at the chosen sites.');
	}
	for (let atom = 0; atom < product.getAllAtoms(); atom++) {
		const label = product.getAtomCustomLabel(atom);
		if (!label?.startsWith(']')) {
			continue;
		}
		product.setAtomCustomLabel(atom, null);
		product.setAtomMass(atom, originalMass.get(Number(label.slice(1))) ?? 0);
	}
	return product;
}

/** The atoms a transform's mapped pattern atoms land on: the first match inside the chosen atoms. */
function siteOf(molecule: Molecule, transform: SiteTransform): number[] {
	return matchSite(molecule, transform).site;
}

/**
 * The first match of a transform's reactant pattern whose mapped atoms all lie among the chosen
 * atoms: `match[q]` is the molecule atom of pattern atom q, `site` the mapped ones in order.
 */
export function matchSite(
	molecule: Molecule,
	transform: SiteTransform
): { site: number[]; match: number[] } {
	const { reactant, mapped } = compileTransform(transform.smarts);
	const allowed = new Set(transform.atoms);
	const searcher = new SSSearcher();
	searcher.setFragment(reactant);
	searcher.setMolecule(molecule);
	if (searcher.findFragmentInMolecule({ countMode: 'overlapping' }) > 0) {
		for (const match of searcher.getMatchList()) {
			const site = mapped.map((q) => match[q]!);
			if (site.every((a) => allowed.has(a))) {
				return { site, match };
			}
		}
	}
	throw new TransformError(
		`"${transform.smarts}" finds no site among atoms ${transform.atoms.join(', ')}.`
	);
}

/**
 * One reaction running every transform at once: reactant patterns as disconnected parts of one
 * reactant (a single "." keeps them in one molecule), map numbers shifted apart, and transform
 * i's mapped atoms requiring marker isotope MARKER + i.
 */
function combinedReaction(smarts: string[]): Reaction {
	const key = smarts.join('\u0001');
	const stored = reactionCache.get(key);
	if (stored) {
		return stored;
	}
	const reactants: string[] = [];
	const products: string[] = [];
	const ranges: number[] = [];
	let offset = 0;
	for (const one of smarts) {
		const { parts, maxMapNo } = compileTransform(one);
		const shift = (side: string) =>
			side.replace(/:(\d+)\]/g, (_, n: string) => `:${Number(n) + offset}]`);
		reactants.push(shift(parts[0]));
		products.push(shift(parts[1]));
		offset += maxMapNo;
		ranges.push(offset);
	}
	const reaction = smartsParser.parseReaction(`${reactants.join('.')}>>${products.join('.')}`);
	const reactant = reaction.getReactant(0);
	for (let atom = 0; atom < reactant.getAllAtoms(); atom++) {
		const mapNo = reactant.getAtomMapNo(atom);
		if (mapNo) {
			reactant.setAtomMass(atom, MARKER + ranges.findIndex((end) => mapNo <= end));
		}
	}
	reactionCache.set(key, reaction);
	return reaction;
}
