// A seeded generator of malformed structure texts for the fuzz test: broken SMILES, molfiles
// (V2000 and V3000) with wrong counts and truncated blocks, SDF records, and control characters.
// Same seed, same texts, so a failure can be replayed.

/** mulberry32: a small, well-known 32-bit PRNG (public domain). */
export function seededRandom(seed: number): () => number {
	let a = seed >>> 0;
	return () => {
		a = (a + 0x6d2b79f5) >>> 0;
		let t = a;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

const CONTROL = [
	'\u0000',
	'\u0001',
	'\u0007',
	'\u001b',
	'\u007f',
	'\u2028',
	'\ufeff',
	'\ud800',
	'\r',
	'\t'
];
const SMILES_PIECES = [
	'C',
	'c',
	'N',
	'O',
	'(',
	')',
	'[',
	']',
	'=',
	'#',
	'1',
	'2',
	'%1',
	'%12',
	'@',
	'@@',
	'/',
	'\\',
	'.',
	'+',
	'-',
	'[Qq]',
	'[999C]',
	'[nH]',
	'[Si]',
	'Cl',
	'*',
	':',
	'$',
	'~'
];
const SYMBOLS = ['C', 'N', 'O', 'H', 'Qq', 'Xx', '', '   ', 'R#', 'Si', '??', '1'];

export function makeMalformedStructures(seed: number, count: number): string[] {
	const random = seededRandom(seed);
	const int = (max: number) => Math.floor(random() * max);
	const pick = <T>(items: readonly T[]): T => items[int(items.length)]!;
	const hugeOr = (small: number) => pick([small, 0, 999, 1000, 1001, 99_999_999, 2 ** 31, -1]);

	const smiles = () => Array.from({ length: 1 + int(40) }, () => pick(SMILES_PIECES)).join('');
	const atomLine = () =>
		`${(random() * 10).toFixed(4).padStart(10)}${(random() * 10).toFixed(4).padStart(10)}    0.0000 ${pick(SYMBOLS).padEnd(3)} 0  0  0  0  0  0  0  0  0  0  0  0`;
	const v2000 = () => {
		const atoms = 1 + int(6);
		const lines = [
			'fuzz',
			'  Orthogon',
			'',
			`${String(hugeOr(atoms)).padStart(3)}${String(hugeOr(atoms - 1)).padStart(3)}  0  0  0  0  0  0  0  0999 V2000`
		];
		for (let i = 0; i < atoms; i++) {
			lines.push(atomLine());
		}
		for (let i = 1; i < atoms; i++) {
			lines.push(
				`${String(i).padStart(3)}${String(pick([i + 1, 0, 99, -3])).padStart(3)}  ${pick([1, 2, 3, 9])}  0`
			);
		}
		if (random() < 0.4) {
			lines.splice(4 + int(atoms), 2 + int(3));
		} // truncated block
		if (random() < 0.8) {
			lines.push('M  END');
		}
		return lines.join('\n');
	};
	const v3000 = () => {
		const atoms = 1 + int(5);
		const lines = [
			'fuzz',
			'  Orthogon',
			'',
			'  0  0  0     0  0            999 V3000',
			'M  V30 BEGIN CTAB',
			`M  V30 COUNTS ${hugeOr(atoms)} ${hugeOr(atoms - 1)} 0 0 0`,
			'M  V30 BEGIN ATOM'
		];
		for (let i = 1; i <= atoms; i++) {
			lines.push(
				`M  V30 ${i} ${pick(SYMBOLS)} ${random() * 5} 0 0 0${random() < 0.1 ? ' MASS=999' : ''}`
			);
		}
		if (random() < 0.8) {
			lines.push('M  V30 END ATOM');
		}
		lines.push('M  V30 BEGIN BOND');
		for (let i = 1; i < atoms; i++) {
			lines.push(`M  V30 ${i} ${pick([1, 2, 7])} ${i} ${pick([i + 1, 0, 50])}`);
		}
		if (random() < 0.7) {
			lines.push('M  V30 END BOND', 'M  V30 END CTAB');
		}
		if (random() < 0.8) {
			lines.push('M  END');
		}
		return lines.join('\n');
	};
	const sdf = () =>
		Array.from(
			{ length: 1 + int(3) },
			() => `${pick([v2000, v3000])()}\n> <id>\n${pick(['x', '', '$$$$', '\u0000'])}\n\n$$$$`
		).join('\n');
	const withControl = (text: string) => {
		const at = int(text.length + 1);
		return text.slice(0, at) + pick(CONTROL) + text.slice(at);
	};
	const makers = [smiles, v2000, v3000, sdf];
	return Array.from({ length: count }, () => {
		const text = pick(makers)();
		return random() < 0.3 ? withControl(text) : text;
	});
}
