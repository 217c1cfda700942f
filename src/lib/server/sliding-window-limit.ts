// A count of tries per key over a sliding window, kept in memory: Floorset runs as one process per
// club (DESIGN.md, "Beyond one machine"), and a restart forgetting the counts does no harm. The
// map is bounded so it cannot grow forever.

const MAX_KEYS = 10_000;

export class SlidingWindowLimit {
	readonly #hits = new Map<string, number[]>();

	constructor(
		readonly max: number,
		readonly windowMs: number,
		readonly maxKeys = MAX_KEYS
	) {}

	/** Counts one try; false when the key has used up its window. */
	take(key: string, now = Date.now()): boolean {
		const recent = (this.#hits.get(key) ?? []).filter((t) => t > now - this.windowMs);
		if (recent.length >= this.max) {
			this.#hits.set(key, recent);
			return false;
		}
		recent.push(now);
		this.#hits.delete(key);
		this.#hits.set(key, recent);
		// Oldest keys first in a Map's order: drop them when the map is full.
		while (this.#hits.size > this.maxKeys) {
			const oldest = this.#hits.keys().next().value;
			if (oldest === undefined) break;
			this.#hits.delete(oldest);
		}
		return true;
	}

	get size() {
		return this.#hits.size;
	}
}
