// The chemistry caches are bounded by bytes and keyed by digests (issue 10, defect 6: 2,000
// keys of 1 MB each took the server to 3.7 GB in 35 s).

import { describe, expect, it } from 'vitest';
import { digestKey, LruCache, normalizeStructureText } from '../../src/lib/chem/cache';
import { CACHE_BYTES } from '../../src/lib/chem/limits';
import {
	clearPerceptionCache,
	perceiveText,
	perceptionCacheUse
} from '../../src/lib/chem/perception-cache';

describe('byte-bounded caches', () => {
	it('stays under its byte bound when fed many large distinct texts', () => {
		const bound = 256 * 1024;
		const cache = new LruCache<number[]>('perceptionByText', bound);
		const filler = 'C'.repeat(1024 * 1024);
		for (let i = 0; i < 2000; i++) {
			cache.set(`${i} ${filler}`, [i, i + 1, i + 2]);
		}
		expect(cache.bytes).toBeLessThanOrEqual(bound);
		expect(cache.size).toBeGreaterThan(100); // small values still fit many at a time
		expect(cache.get(`1999 ${filler}`)).toEqual([1999, 2000, 2001]); // the newest is kept
		expect(cache.get(`0 ${filler}`)).toBeUndefined(); // the oldest went
	});
	it('getOrSet makes a value once per normalised key and keeps nothing when making it throws', () => {
		const cache = new LruCache<number[]>('perceptionByText', 64 * 1024);
		let made = 0;
		const make = () => [++made];
		expect(cache.getOrSet('CCO', make)).toEqual([1]);
		expect(cache.getOrSet(' CCO \n', make)).toEqual([1]);
		expect(made).toBe(1);
		expect(() =>
			cache.getOrSet('C1CC', () => {
				throw new Error('unclosed ring');
			})
		).toThrow('unclosed ring');
		expect(cache.get('C1CC')).toBeUndefined();
	});
	it('counts a value by its size: one huge value is not kept at all', () => {
		const cache = new LruCache<string>('drawnStructures', 10_000);
		cache.set('a', 'x'.repeat(20_000));
		expect(cache.size).toBe(0);
	});
	it('keys by a digest of the normalised text: line ends and trailing blanks do not matter', () => {
		expect(digestKey('CCO')).toMatch(/^[\w-]{43}$/);
		expect(digestKey(' CCO \n')).toBe(digestKey('CCO'));
		expect(digestKey('\nmol\r\n  x  \r\n')).toBe(digestKey('\nmol\n  x'));
		// A molfile's empty title line is part of the molfile and stays.
		expect(normalizeStructureText('\n  Orthogon\n')).toBe('\n  Orthogon');
		expect(digestKey('CCO')).not.toBe(digestKey('OCC'));
	});
	it('the perception text cache holds digests, not the texts it was given', () => {
		clearPerceptionCache();
		// 200 distinct texts of 256 KB each (a SMILES with a long title): 50 MB of text.
		const title = 'x'.repeat(256 * 1024);
		for (let i = 0; i < 200; i++) {
			perceiveText(`${'C'.repeat((i % 20) + 1)}O ${i}${title}`);
		}
		const use = perceptionCacheUse().byText;
		expect(use.entries).toBe(200);
		expect(use.bytes).toBeLessThan(200 * 2048);
		expect(use.bytes).toBeLessThanOrEqual(CACHE_BYTES.perceptionByText);
	});
});
