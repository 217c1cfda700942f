// A seeded generator so the same input and seed always give the same plan (lib/random.ts).
import { seededRandom } from '../random';

export interface Rng {
	/** Uniform in [0, 1). */
	next(): number;
	/** Uniform integer in [0, n). */
	int(n: number): number;
}

export function createRng(seed: number): Rng {
	const next = seededRandom((Math.floor(seed) ^ 0x9e3779b9) >>> 0);
	return { next, int: (n: number) => Math.floor(next() * n) };
}
