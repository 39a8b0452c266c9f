// A SMILES (or the product side of a reaction SMARTS) read as written: each atom's token text,
// each bond's symbol, and where every atom token and ring-closure digit sits in the text. The
// SMILES splicer (smiles-splice.ts) edits a chemist's SMILES in place with it, so what it does not
// touch (stereo marks, aromatic writing, atom order) stays exactly as the chemist wrote it.

export type WrittenAtom = {
	/** The token as written, e.g. `C`, `[C@@H]`, `[nH]`; `[O:1]` is kept with its map number. */
	text: string;
	start: number;
	/** Just after the token and its ring-closure digits: where a branch of new atoms can go. */
	end: number;
	/** Atom map number (`[O:1]` → 1), 0 when none. */
	mapNo: number;
};
export type WrittenBond = { from: number; to: number; symbol: string };
export type WrittenGraph = { atoms: WrittenAtom[]; bonds: WrittenBond[]; ringNumbers: Set<number> };

export class SmilesGraphError extends Error {}

const ORGANIC = /^(Cl|Br|B|C|N|O|P|S|F|I|b|c|n|o|p|s|\*)/;
const BOND = /^[-=#$:/\\~]/;
const RING = /^[-=#$:/\\]?(%\d\d|\d)/;

/** Reads a SMILES's graph as written, e.g. `writtenGraph('CC(=O)C')` → 4 atoms, bonds 0–1, 1–2 (`=`), 1–3. */
export function writtenGraph(smiles: string): WrittenGraph {
	const atoms: WrittenAtom[] = [];
	const bonds: WrittenBond[] = [];
	const ringNumbers = new Set<number>();
	const open = new Map<number, { atom: number; symbol: string }>();
	const branches: number[] = [];
	let previous = -1;
	let bond = '';
	let i = 0;
	while (i < smiles.length) {
		const rest = smiles.slice(i);
		const ch = smiles[i]!;
		if (ch === '(') {
			branches.push(previous);
			i++;
		} else if (ch === ')') {
			if (branches.length === 0) {
				throw new SmilesGraphError(`")" without "(" in ${smiles}`);
			}
			previous = branches.pop()!;
			i++;
		} else if (ch === '.') {
			previous = -1;
			i++;
		} else if (RING.test(rest) && previous >= 0 && atoms[previous]!.end === i) {
			const [written, number] = RING.exec(rest)!;
			const n = Number(number!.replace('%', ''));
			const symbol = written.slice(0, written.length - number!.length) || bond;
			bond = '';
			ringNumbers.add(n);
			const partner = open.get(n);
			if (partner) {
				bonds.push({ from: partner.atom, to: previous, symbol: partner.symbol || symbol });
				open.delete(n);
			} else {
				open.set(n, { atom: previous, symbol });
			}
			i += written.length;
			atoms[previous]!.end = i;
		} else if (BOND.test(rest)) {
			bond = ch;
			i++;
		} else {
			let text: string;
			if (ch === '[') {
				const close = smiles.indexOf(']', i);
				if (close < 0) {
					throw new SmilesGraphError(`"[" never closed in ${smiles}`);
				}
				text = smiles.slice(i, close + 1);
			} else {
				const organic = ORGANIC.exec(rest);
				if (!organic) {
					throw new SmilesGraphError(`unexpected "${ch}" in ${smiles}`);
				}
				text = organic[1]!;
			}
			const mapNo = Number(/:(\d+)\]$/.exec(text)?.[1] ?? 0);
			const index = atoms.length;
			atoms.push({ text, start: i, end: i + text.length, mapNo });
			if (previous >= 0) {
				bonds.push({ from: previous, to: index, symbol: bond });
			}
			bond = '';
			previous = index;
			i += text.length;
		}
	}
	if (open.size || branches.length) {
		throw new SmilesGraphError(`unclosed ring or branch in ${smiles}`);
	}
	return { atoms, bonds, ringNumbers };
}

/** Bond order a written symbol stands for: `=` 2, `#` 3, `$` 4, anything else 1 (aromatic bonds count 1). */
export function writtenOrder(symbol: string): number {
	return symbol === '=' ? 2 : symbol === '#' ? 3 : symbol === '$' ? 4 : 1;
}
