// Answers computed from the database, kept until the database changes (see change-stamp.ts).
// Bounded by bytes, oldest first out, so a burst of distinct queries cannot grow the process.
export interface Sized {
	byteLength: number;
}

const byteLengthOf = (v: unknown) => (v as Sized).byteLength;

export class StampedCache<V> {
	#stamp = '';
	#entries = new Map<string, V>();
	#bytes = 0;
	hits = 0;
	misses = 0;

	/** `sizeOf` counts a value's bytes; by default its `byteLength`. */
	constructor(
		readonly maxBytes: number,
		readonly sizeOf: (value: V) => number = byteLengthOf
	) {}

	/** The value kept for `key`, if it was computed under this same stamp. */
	get(key: string, stamp: string): V | undefined {
		if (stamp !== this.#stamp) this.clear(stamp);
		const kept = this.#entries.get(key);
		if (kept !== undefined) this.hits++;
		else this.misses++;
		return kept;
	}

	/**
	 * Keeps a value computed under `stamp`. The caller reads the stamp before computing and
	 * again after: a value whose computation overlapped a write is not kept.
	 */
	set(key: string, stamp: string, value: V) {
		if (stamp !== this.#stamp) this.clear(stamp);
		const size = this.sizeOf(value);
		if (size > this.maxBytes) return;
		const old = this.#entries.get(key);
		if (old !== undefined) this.#bytes -= this.sizeOf(old);
		this.#entries.delete(key);
		this.#entries.set(key, value);
		this.#bytes += size;
		for (const [oldest, v] of this.#entries) {
			if (this.#bytes <= this.maxBytes) break;
			this.#entries.delete(oldest);
			this.#bytes -= this.sizeOf(v);
		}
	}

	/** For synchronous computations, which no write can overlap. */
	through(key: string, stamp: string, compute: () => V): V {
		const kept = this.get(key, stamp);
		if (kept !== undefined) return kept;
		const value = compute();
		this.set(key, stamp, value);
		return value;
	}

	clear(stamp = '') {
		this.#stamp = stamp;
		this.#entries.clear();
		this.#bytes = 0;
	}

	get size() {
		return this.#entries.size;
	}

	get bytes() {
		return this.#bytes;
	}
}
