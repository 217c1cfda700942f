// A small seeded generator so the same input and seed always give the same plan.
// mulberry32 (Tommy Ettinger's public-domain generator, from memory): 32-bit state, full period.

export interface Rng {
	/** Uniform in [0, 1). */
	next(): number;
	/** Uniform integer in [0, n). */
	int(n: number): number;
}

export function createRng(seed: number): Rng {
	let state = (Math.floor(seed) ^ 0x9e3779b9) >>> 0;
	const next = (): number => {
		state = (state + 0x6d2b79f5) >>> 0;
		let t = state;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
	return { next, int: (n: number) => Math.floor(next() * n) };
}
