// A small least-recently-used map. Perception is a pure function of the molecule, so its results
// can be kept; the bound keeps a long-running server from growing without limit.

/** LRU map, e.g. `const cache = new LruCache<string, number>(2); cache.set('a', 1)`. */
export class LruCache<K, V> {
	readonly #entries = new Map<K, V>();
	readonly #capacity: number;

	constructor(capacity: number) {
		this.#capacity = Math.max(1, capacity);
	}

	get(key: K): V | undefined {
		const value = this.#entries.get(key);
		if (value === undefined) return undefined;
		// Re-insert so the entry becomes the most recently used.
		this.#entries.delete(key);
		this.#entries.set(key, value);
		return value;
	}

	set(key: K, value: V): void {
		this.#entries.delete(key);
		this.#entries.set(key, value);
		if (this.#entries.size > this.#capacity) this.#entries.delete(this.#entries.keys().next().value as K);
	}

	get size(): number {
		return this.#entries.size;
	}

	clear(): void {
		this.#entries.clear();
	}
}
