// Least-recently-used caches bounded by bytes, not by entry count: a count bound let 2,000 keys
// of 1 MB each take a server to 3.7 GB (issue 10, defect 6). Keys are SHA-256 digests of the
// normalised key text, so a cache never holds a structure's text, only its 43-character digest.

import { createHash } from 'node:crypto';
import { LRUCache } from 'lru-cache';
import { CACHE_BYTES } from './limits';

/** Bytes a digest key occupies (43 base64url characters, UTF-16) plus the map entry around it. */
const KEY_BYTES = 43 * 2 + 64;

/**
 * Structure text in the form two equivalent writings share: LF line ends, no trailing blanks on a
 * line, no blank lines at the end; a one-line text (SMILES) is also trimmed at the start. Leading
 * newlines of a molfile stay: its first line is the (possibly empty) title.
 * E.g. `normalizeStructureText(' CCO \r\n')` → `'CCO'`.
 */
export function normalizeStructureText(text: string): string {
	const lines = text
		.replace(/\r\n?/g, '\n')
		.replace(/[ \t]+$/gm, '')
		.replace(/\n+$/, '');
	return lines.includes('\n') ? lines : lines.trimStart();
}

/** The cache key of a text, e.g. `digestKey('CCO')` → 43 base64url characters. */
export function digestKey(text: string): string {
	return createHash('sha256').update(normalizeStructureText(text)).digest('base64url');
}

/** Rough bytes of a plain value: UTF-16 of its JSON, which is what the heap holds within a factor of 2. */
export function jsonBytes(value: unknown): number {
	return (JSON.stringify(value)?.length ?? 8) * 2;
}

/**
 * LRU map over digested keys, bounded by `maxBytes`, e.g.
 * `const cache = new LruCache<number[]>('followed steps', 8 * 2 ** 20); cache.set(text, [1])`.
 */
export class LruCache<V extends NonNullable<unknown>> {
	readonly #entries: LRUCache<string, V>;

	constructor(
		readonly name: keyof typeof CACHE_BYTES,
		maxBytes: number = CACHE_BYTES[name],
		sizeOf: (value: V) => number = jsonBytes
	) {
		this.#entries = new LRUCache<string, V>({
			maxSize: Math.max(1, maxBytes),
			sizeCalculation: (value) => Math.max(1, KEY_BYTES + sizeOf(value))
		});
	}

	get(key: string): V | undefined {
		return this.#entries.get(digestKey(key));
	}

	set(key: string, value: V): void {
		this.#entries.set(digestKey(key), value);
	}

	/** The value kept for `key`, else `make()`'s, kept: one digest of the key where get + set take two. */
	getOrSet(key: string, make: () => V): V {
		const digest = digestKey(key);
		const stored = this.#entries.get(digest);
		if (stored !== undefined) {
			return stored;
		}
		const fresh = make();
		this.#entries.set(digest, fresh);
		return fresh;
	}

	/** Entries held now. */
	get size(): number {
		return this.#entries.size;
	}

	/** Bytes held now, as the size calculation counts them (never above the bound). */
	get bytes(): number {
		return this.#entries.calculatedSize;
	}

	clear(): void {
		this.#entries.clear();
	}
}
