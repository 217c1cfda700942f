// The one seeded generator: the same seed always gives the same song, plan or benchmark data.
// mulberry32, Tommy Ettinger's public-domain 32-bit generator (from memory); ample for noise,
// shuffles and invented data, not for anything secret.

export type Random = () => number;

export function seededRandom(seed: number): Random {
	let state = seed >>> 0;
	return () => {
		state = (state + 0x6d2b79f5) >>> 0;
		let t = state;
		t = Math.imul(t ^ (t >>> 15), t | 1);
		t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
		return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
	};
}

/** Uniform in [lo, hi). */
export const between = (random: Random, lo: number, hi: number): number =>
	lo + (hi - lo) * random();
