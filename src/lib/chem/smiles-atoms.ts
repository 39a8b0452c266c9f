// Where each atom of a SMILES string starts, so an error about atom 7 can point at a character.
// openchemlib numbers SMILES atoms in the order they are written, which is what this relies on.

export type SmilesAtomToken = { position: number; symbol: string; aromatic: boolean };

const ORGANIC = /^(Cl|Br|B|C|N|O|P|S|F|I|b|c|n|o|p|s|\*)/;

/** Lists the atoms of a SMILES in writing order, e.g. `smilesAtoms('C[nH]')` → `[{ position: 0, symbol: 'C' }, { position: 1, symbol: 'n' }]`. */
export function smilesAtoms(smiles: string): SmilesAtomToken[] {
	const atoms: SmilesAtomToken[] = [];
	let i = 0;
	while (i < smiles.length) {
		const ch = smiles[i]!;
		if (ch === '[') {
			const close = smiles.indexOf(']', i);
			const inside = smiles.slice(i + 1, close < 0 ? undefined : close);
			const symbol = /^\d*([A-Za-z][a-z]?|\*)/.exec(inside)?.[1] ?? '?';
			atoms.push({ position: i, symbol, aromatic: /^[a-z]/.test(symbol) });
			i = close < 0 ? smiles.length : close + 1;
			continue;
		}
		if (ch === '%') {
			i += 3; // two-digit ring closure
			continue;
		}
		const organic = ORGANIC.exec(smiles.slice(i));
		if (organic) {
			const symbol = organic[1]!;
			atoms.push({ position: i, symbol, aromatic: /^[a-z]/.test(symbol) });
			i += symbol.length;
			continue;
		}
		i += 1;
	}
	return atoms;
}
