// Tuning tool (not run by tests): for each of 96 generated songs, the range of the score's lift
// exponent (score.ts) that picks the true tempo over its ×½, ×⅓, ×2, ×3 and ×3/2 relatives,
// and the range that suits them all. `npx tsx scripts/analyse/dev-bounds.ts`.
import { generateSong } from '../../src/lib/synth/song';
import { onsetEnvelope } from '../../src/lib/tempo/onset';
import { refine, bpmToPeriod } from '../../src/lib/tempo/comb';
import { salience } from '../../src/lib/tempo/score';
const rate = 11025;
let lo = -9,
	hi = 9;
const rows: string[] = [];
for (let i = 0; i < 96; i++) {
	const bpm = Math.round(60 + (140 * ((i * 37) % 96)) / 95);
	const meter = i % 2 ? 3 : 4;
	const swing = [1, 0.5, 0][i % 3];
	const pad = i % 4 < 2;
	const noise = [0, 0.03, 0.1, 0.2][(i >> 2) % 4];
	const s = generateSong({
		bpm,
		meter,
		durationS: 30,
		swing,
		pad,
		noise,
		seed: 500 + i,
		sampleRate: rate
	});
	const env = onsetEnvelope(s.samples, rate);
	const sal = (k: number) => salience(refine(env, bpmToPeriod(bpm * k, env.frameRate)));
	const t = sal(1);
	const slower = meter === 3 ? [0.5, 1 / 3] : [0.5];
	const faster = meter === 3 ? [2, 3, 1.5] : [2, 3];
	// s(kT) = sal(kT)·k^λ: T beats a slower k<1 when λ > log(sal(k)/t)/log(1/k), a faster k>1 when λ < log(t/sal(k))/log(k).
	const l = Math.max(...slower.map((k) => Math.log(sal(k) / t) / Math.log(1 / k)));
	const h = Math.min(...faster.map((k) => Math.log(t / Math.max(1e-6, sal(k))) / Math.log(k)));
	lo = Math.max(lo, l);
	hi = Math.min(hi, h);
	rows.push(
		`${bpm} m${meter} sw${swing} pad${+pad} n${noise}: [${l.toFixed(2)}, ${h.toFixed(2)}]${l > h ? ' EMPTY' : ''}`
	);
}
console.log(rows.join('\n'));
console.log('feasible lift', lo.toFixed(3), hi.toFixed(3));
