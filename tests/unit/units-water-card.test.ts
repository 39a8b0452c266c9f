import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { analyzeStructure } from '../../src/lib/chem/analyze';
import {
	ACETAL_GROUPS,
	installedAcetal,
	logProblems,
	plotLines,
	statusText
} from '../../src/lib/client/quantities-water';

describe('installedAcetal: the card is offered where a step puts an acetal or ketal on', () => {
	// 4-methylbenzaldehyde and its ethylene acetal; cyclohexanone and its propylene ketal; a
	// Grignard addition that installs nothing (common practice).
	const aldehyde = analyzeStructure('Cc1ccc(C=O)cc1');
	const dioxolane = analyzeStructure('Cc1ccc(C2OCCO2)cc1');

	it('finds the dioxolane made from an aldehyde, and the dioxane made from a ketone', () => {
		expect(installedAcetal([aldehyde], dioxolane)).toBe('dioxolane');
		const ketone = analyzeStructure('O=C1CCCCC1');
		expect(installedAcetal([ketone], analyzeStructure('C1CCC2(CC1)OCCCO2'))).toBe('dioxane');
	});

	it('offers nothing for a step that keeps or removes the acetal, or before the analyses arrive', () => {
		expect(installedAcetal([dioxolane], dioxolane)).toBeNull();
		expect(installedAcetal([dioxolane], aldehyde)).toBeNull();
		expect(installedAcetal([undefined], dioxolane)).toBeNull();
		expect(installedAcetal([aldehyde], undefined)).toBeNull();
	});

	it('names only protecting groups the rule table knows', () => {
		const table: { id: string }[] = JSON.parse(
			readFileSync(new URL('../../rules/protecting-groups.json', import.meta.url), 'utf8')
		);
		const known = new Set(table.map((pg) => pg.id));
		expect(Object.keys(ACETAL_GROUPS).filter((id) => !known.has(id))).toEqual([]);
	});
});

describe('the trap log', () => {
	it('flags times that go backwards and totals that shrink, by reading number', () => {
		expect(
			logProblems([
				{ minutes: 0, volume: 0 },
				{ minutes: 30, volume: 1.2 },
				{ minutes: 20, volume: 1.5 },
				{ minutes: 40, volume: 1.0 }
			])
		).toEqual([
			'Reading 3: 20 min comes before reading 2 (30 min); list readings in time order.',
			'Reading 4: 1 mL is less than before (1.5 mL); the trap only fills, so record the total collected.'
		]);
		expect(
			logProblems([
				{ minutes: 0, volume: 0 },
				{ minutes: 15, volume: 0.8 }
			])
		).toEqual([]);
	});

	it('words each status plainly; over theory says why and which layer to read', () => {
		expect(statusText('collecting', 41.6, 'lower')).toMatch(/^Still collecting: 42 %/);
		expect(statusText('complete', 97, 'lower')).toMatch(/^Complete: .*97 %/);
		const over = statusText('over-theory', 118, 'upper');
		expect(over).toMatch(/118 % of theory/);
		expect(over).toMatch(/wet/);
		expect(over).toMatch(/read only the upper layer/);
	});

	it('plots the readings and a flat theoretical line over the same time span', () => {
		const lines = plotLines(
			[
				{ minutes: 0, volume: 0 },
				{ minutes: 90, volume: 2.9 }
			],
			3.0
		);
		expect(lines.collected).toEqual([
			{ x: 0, y: 0 },
			{ x: 90, y: 2.9 }
		]);
		expect(lines.theory).toEqual([
			{ x: 0, y: 3 },
			{ x: 90, y: 3 }
		]);
		expect(plotLines([], undefined).theory).toEqual([]);
	});
});
