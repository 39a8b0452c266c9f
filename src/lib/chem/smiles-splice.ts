// Applies install transforms (reaction SMARTS from rules/protecting-groups.json) by editing the
// chemist's SMILES text instead of running openchemlib's Reactor: the new atoms are written as a
// branch on the atom they attach to, ring bonds back to the substrate get fresh ring numbers, and
// atoms the transform removes (a ketone's =O, a boronic acid's OH) are cut out of the text.
// No 2D coordinates are invented and no canonical SMILES is computed (together ~50 ms for a
// 130-atom product, most of first sight of a route); the untouched text keeps its stereo marks as
// written. The molecule is the one the Reactor makes (tests/unit/chem-splice.test.ts).
//
// Anything outside what a PG install does (a stereo mark on an atom that gains or loses a bond,
// a bond between mapped atoms that changes, a charge on a mapped atom, a removed atom that is not
// a plain end atom) throws SpliceUnsupported, and the caller falls back to the Reactor.

import type { Molecule } from 'openchemlib';
import { writtenGraph, writtenOrder, type WrittenGraph } from './smiles-graph';
import { compileTransform, matchSite, type SiteTransform } from './transform';

export class SpliceUnsupported extends Error {}

type Edit = { start: number; end: number; text: string };

const productSides = new Map<string, WrittenGraph>();
function productSide(smarts: string): WrittenGraph {
	let graph = productSides.get(smarts);
	if (!graph) {
		graph = writtenGraph(compileTransform(smarts).parts[1]);
		productSides.set(smarts, graph);
	}
	return graph;
}

/**
 * The SMILES with every transform applied at its own site, e.g. TBS on the secondary alcohol of
 * `OCCC(O)C` (atoms [4]) → `OCCC(O[Si](C)(C)C(C)(C)C)C`. `molecule` is `smiles` as openchemlib
 * read it (atom i is the i-th atom written). Throws SpliceUnsupported (see above) or TransformError.
 */
export function spliceTransforms(
	smiles: string,
	molecule: Molecule,
	transforms: readonly SiteTransform[]
): string {
	const graph = writtenGraph(smiles);
	if (
		graph.atoms.length !== molecule.getAllAtoms() ||
		graph.bonds.length !== molecule.getAllBonds()
	) {
		throw new SpliceUnsupported('the SMILES and its molecule do not number atoms alike');
	}
	const neighbours = graph.atoms.map((): { atom: number; symbol: string }[] => []);
	for (const b of graph.bonds) {
		neighbours[b.from]!.push({ atom: b.to, symbol: b.symbol });
		neighbours[b.to]!.push({ atom: b.from, symbol: b.symbol });
	}
	const bondOrder = (a: number, b: number) => {
		const bond = molecule.getBond(a, b);
		return bond < 0 ? 0 : molecule.getBondOrder(bond);
	};
	const used = new Set(graph.ringNumbers);
	const freshRing = () => {
		for (let n = 1; n < 100; n++) {
			if (used.has(n)) {
				continue;
			}
			used.add(n);
			return n < 10 ? String(n) : `%${n}`;
		}
		throw new SpliceUnsupported('no ring-closure number left');
	};
	const claimed = new Set<number>();
	const deleted = new Set<number>();
	// Per substrate atom: ring digits, branches, and the change in its bond orders.
	const digits = new Map<number, string[]>();
	const branches = new Map<number, string[]>();
	const orderChange = new Map<number, number>();
	const add = <T>(map: Map<number, T[]>, atom: number, item: T) =>
		map.set(atom, [...(map.get(atom) ?? []), item]);
	const shiftOrder = (atom: number, by: number) =>
		orderChange.set(atom, (orderChange.get(atom) ?? 0) + by);

	for (const transform of transforms) {
		const { reactant } = compileTransform(transform.smarts);
		const { match } = matchSite(molecule, transform);
		const product = productSide(transform.smarts);
		const atomOfMap = new Map<number, number>();
		match.forEach((atom, query) => {
			if (claimed.has(atom)) {
				throw new SpliceUnsupported(`two transforms claim atom ${atom}`);
			}
			claimed.add(atom);
			const mapNo = reactant.getAtomMapNo(query);
			if (mapNo) {
				atomOfMap.set(mapNo, atom);
			} else {
				deleted.add(atom);
			}
		});
		const substrateAtom = (p: number) => atomOfMap.get(product.atoms[p]!.mapNo);
		// Bonds between mapped atoms must stay as they are (no PG install changes them).
		for (let b = 0; b < reactant.getAllBonds(); b++) {
			const [q1, q2] = [reactant.getBondAtom(0, b), reactant.getBondAtom(1, b)];
			const [m1, m2] = [reactant.getAtomMapNo(q1), reactant.getAtomMapNo(q2)];
			if (!m1 || !m2) {
				continue;
			}
			const kept = product.bonds.some((pb) => {
				const ends = [product.atoms[pb.from]!.mapNo, product.atoms[pb.to]!.mapNo];
				return ends.includes(m1) && ends.includes(m2);
			});
			if (!kept) {
				throw new SpliceUnsupported(`${transform.smarts} breaks a bond between mapped atoms`);
			}
		}
		for (const pb of product.bonds) {
			const [a, b] = [substrateAtom(pb.from), substrateAtom(pb.to)];
			if (a !== undefined && b !== undefined && bondOrder(a, b) !== writtenOrder(pb.symbol)) {
				throw new SpliceUnsupported(
					`${transform.smarts} makes or changes a bond between mapped atoms`
				);
			}
		}
		// A charged mapped atom (the boron of a MIDA boronate) changes its valence: left to the Reactor.
		for (const p of product.atoms) {
			if (p.mapNo && /[+-]/.test(p.text)) {
				throw new SpliceUnsupported(`${transform.smarts} charges a mapped atom`);
			}
		}
		writeNewAtoms(product, substrateAtom, graph, freshRing, (atom, kind, text, order) => {
			add(kind === 'digit' ? digits : branches, atom, text);
			shiftOrder(atom, order);
		});
		for (const atom of match) {
			if (!deleted.has(atom)) {
				continue;
			}
			const [only, ...more] = neighbours[atom]!;
			if (!only || more.length || deleted.has(only.atom)) {
				throw new SpliceUnsupported('a removed atom is not an end atom');
			}
			shiftOrder(only.atom, -bondOrder(atom, only.atom));
		}
	}

	const edits: Edit[] = [...deleted].map((atom) => cutOut(smiles, graph, atom));
	const cut = (position: number) => edits.find((e) => e.start <= position && position < e.end);
	for (const [atom, change] of orderChange) {
		const written = graph.atoms[atom]!;
		if (written.text.includes('@')) {
			throw new SpliceUnsupported('a stereo centre would gain or lose a bond');
		}
		const token = change ? withHydrogens(written.text, change) : written.text;
		if (token !== written.text) {
			edits.push({ start: written.start, end: written.start + written.text.length, text: token });
		}
		const after = [...(digits.get(atom) ?? [])];
		const own = branches.get(atom) ?? [];
		// The last new branch continues the chain when nothing follows the atom.
		let next = written.end;
		while (cut(next)) {
			next = cut(next)!.end;
		}
		const endsHere = next >= smiles.length || smiles[next] === ')' || smiles[next] === '.';
		own.forEach((branch, i) =>
			after.push(endsHere && i === own.length - 1 ? branch : `(${branch})`)
		);
		edits.push({ start: written.end, end: written.end, text: after.join('') });
	}
	let text = smiles;
	for (const edit of edits.sort((a, b) => b.start - a.start || b.end - a.end)) {
		text = text.slice(0, edit.start) + edit.text + text.slice(edit.end);
	}
	return text;
}

/**
 * Writes each group of new atoms of a product side as one branch on the substrate atom it hangs
 * from; its other bonds to substrate atoms, and its own rings, become fresh ring numbers.
 */
function writeNewAtoms(
	product: WrittenGraph,
	substrateAtom: (p: number) => number | undefined,
	graph: WrittenGraph,
	freshRing: () => string,
	put: (atom: number, kind: 'digit' | 'branch', text: string, order: number) => void
): void {
	const isNew = (p: number) => substrateAtom(p) === undefined;
	const edges = product.atoms.map((): { to: number; symbol: string }[] => []);
	for (const b of product.bonds) {
		edges[b.from]!.push({ to: b.to, symbol: b.symbol });
		edges[b.to]!.push({ to: b.from, symbol: b.symbol });
	}
	const visited = new Set<number>();
	const position = (p: number) => graph.atoms[substrateAtom(p)!]!.start;
	// Attachments in text order, so a branch hangs from the first substrate atom it touches.
	const attachments = product.bonds
		.flatMap((b) => [
			{ mapped: b.from, atom: b.to, symbol: b.symbol },
			{ mapped: b.to, atom: b.from, symbol: b.symbol }
		])
		.filter((a) => !isNew(a.mapped) && isNew(a.atom))
		.sort((a, b) => position(a.mapped) - position(b.mapped));
	for (const root of attachments) {
		if (visited.has(root.atom)) {
			continue;
		}
		// Ring numbers of bonds not on the depth-first tree, keyed by their two ends.
		const ringOf = new Map<string, string>();
		const pair = (a: number, b: number) => (a < b ? `${a}-${b}` : `${b}-${a}`);
		const tree = new Set<string>([pair(root.mapped, root.atom)]);
		const order: number[] = [];
		const explore = (p: number) => {
			visited.add(p);
			order.push(p);
			for (const e of edges[p]!) {
				if (isNew(e.to) && !visited.has(e.to)) {
					tree.add(pair(p, e.to));
					explore(e.to);
				}
			}
		};
		explore(root.atom);
		const write = (p: number): string => {
			let out = product.atoms[p]!.text;
			const children: string[] = [];
			for (const e of edges[p]!) {
				const key = pair(p, e.to);
				if (tree.has(key)) {
					if (isNew(e.to) && order.indexOf(e.to) > order.indexOf(p)) {
						children.push(e.symbol + write(e.to));
					}
					continue;
				}
				if (!isNew(e.to)) {
					// A ring bond back to the substrate: the digit on the substrate atom too.
					const ring = freshRing();
					put(substrateAtom(e.to)!, 'digit', e.symbol + ring, writtenOrder(e.symbol));
					out += e.symbol + ring;
					continue;
				}
				if (!ringOf.has(key)) {
					ringOf.set(key, freshRing());
				}
				out += e.symbol + ringOf.get(key)!;
			}
			return out + children.map((c, i) => (i === children.length - 1 ? c : `(${c})`)).join('');
		};
		put(
			substrateAtom(root.mapped)!,
			'branch',
			root.symbol + write(root.atom),
			writtenOrder(root.symbol)
		);
	}
}

/** The text to remove for an end atom: its branch `(=O)`, its tail `=O`, or its head `O=`. */
function cutOut(smiles: string, graph: WrittenGraph, atom: number): Edit {
	const { start, end, text } = graph.atoms[atom]!;
	if (end !== start + text.length) {
		throw new SpliceUnsupported('a removed atom closes a ring');
	}
	const bonded = /[-=#$:~]/.test(smiles[start - 1] ?? '') ? start - 1 : start;
	if (/[/\\]/.test(smiles[start - 1] ?? '') || /[/\\]/.test(smiles[end] ?? '')) {
		throw new SpliceUnsupported('a removed atom carries a double-bond stereo mark');
	}
	const before = smiles[bonded - 1];
	if (before === '(' && smiles[end] === ')') {
		return { start: bonded - 1, end: end + 1, text: '' };
	}
	const last = end >= smiles.length || smiles[end] === ')' || smiles[end] === '.';
	if (last && bonded > 0 && before !== '(' && before !== '.') {
		return { start: bonded, end, text: '' };
	}
	if (start === 0 || before === '.') {
		const bond = /[-=#$:~]/.test(smiles[end] ?? '') ? 1 : 0;
		if (/^[A-Za-z[*]/.test(smiles[end + bond] ?? '')) {
			return { start, end: end + bond, text: '' };
		}
	}
	throw new SpliceUnsupported('a removed atom sits where its text cannot be cut out');
}

/** A bracket atom with its hydrogen count lowered by `bonds` (`[nH]`, 1 → `n`); plain atoms get theirs from valence. */
function withHydrogens(token: string, bonds: number): string {
	if (!token.startsWith('[')) {
		return token;
	}
	const parts = /^\[(\d*)([A-Z][a-z]?|[a-z][a-z]?|\*)(@*)(?:H(\d*))?(.*)\]$/.exec(token);
	if (!parts) {
		throw new SpliceUnsupported(`cannot read the atom ${token}`);
	}
	const [, isotope, symbol, chiral, hydrogens, rest] = parts;
	const count = (hydrogens === undefined ? 0 : hydrogens === '' ? 1 : Number(hydrogens)) - bonds;
	if (count < 0) {
		throw new SpliceUnsupported(`${token} has no hydrogen left for a new bond`);
	}
	const h = count === 0 ? '' : count === 1 ? 'H' : `H${count}`;
	return `[${isotope}${symbol}${chiral}${h}${rest}]`;
}
