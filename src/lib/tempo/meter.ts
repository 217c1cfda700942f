// Meter from accents: the bass at each beat, grouped in threes or in fours. A waltz's strong
// "one" and lighter "two, three" make the groups of three unequal; a 4/4 backbeat repeats every
// two beats, so groups of three come out even. (Common practice, no source.)
import type { Meter } from '../domain';
import type { Fold } from './comb';
import type { Envelope } from './onset';

export interface MeterGuess {
	meter: Meter;
	/** How uneven the groups are: (strongest class − the rest) ÷ overall mean, per grouping. */
	contrast3: number;
	contrast4: number;
	/** Beat index (0-based from the first beat) of the first downbeat. */
	downbeat: number;
	/** The accents show a grouping; false when the beats are all alike (then 4 is a default,
	 * as when bars are taken for beats). */
	accented: boolean;
}

/** The bass rise at each beat (the largest within two frames, as hits and frames jitter). */
export function beatStrengths(env: Envelope, f: Fold): number[] {
	const x = env.bass;
	const out: number[] = [];
	for (let pos = f.phase; pos < x.length - 2; pos += f.period) {
		const i = Math.round(pos);
		let v = 0;
		for (let j = Math.max(0, i - 2); j <= i + 2; j++) v = Math.max(v, x[j]);
		out.push(v);
	}
	return out;
}

function contrast(b: number[], m: number): { value: number; strongest: number } {
	const sums = new Array<number>(m).fill(0);
	const counts = new Array<number>(m).fill(0);
	b.forEach((v, k) => {
		sums[k % m] += v;
		counts[k % m]++;
	});
	const means = sums.map((s, j) => (counts[j] ? s / counts[j] : 0));
	const all = means.reduce((a, v) => a + v, 0) / m;
	let strongest = 0;
	for (let j = 1; j < m; j++) if (means[j] > means[strongest]) strongest = j;
	const rest = (all * m - means[strongest]) / (m - 1);
	return { value: all > 0 ? (means[strongest] - rest) / all : 0, strongest };
}

// Accent contrast below which the beats count as all alike (a backbeat gives 0.55–0.75, a
// waltz ~1.5, bars taken for beats 0.03–0.2; measured on generated songs).
const ACCENTED = 0.3;

export function guessMeter(env: Envelope, f: Fold, hint?: Meter): MeterGuess {
	const b = beatStrengths(env, f);
	const c3 = contrast(b, 3);
	const c4 = contrast(b, 4);
	// Two bars at least before trusting the accents; otherwise 4/4, the common case. Threes only
	// where the accents show a grouping at all (ACCENTED): beats that are all alike are the
	// 4/4 default, as `accented` below says. (Until 2026-12 a contrast of 0.15 sufficed; at
	// ACCENTED the tuning half's meter goes from 95 to 97 %, tempo unchanged: an unaccented
	// scale and a grace-note study were read as 3/4.)
	const three =
		hint !== undefined
			? hint === 3
			: b.length >= 6 && c3.value > ACCENTED && c3.value > 1.3 * c4.value;
	return {
		meter: three ? 3 : 4,
		contrast3: c3.value,
		contrast4: c4.value,
		downbeat: three ? c3.strongest : c4.strongest,
		accented: Math.max(c3.value, c4.value) > ACCENTED
	};
}
