// Tuning tool (not run by tests): resolution accuracy on 48 generated songs in Node, without
// the detector. `npx tsx scripts/analyse/dev-node.ts [verbose]`; RATE=12000 for another rate.
import { generateSong } from '../../src/lib/synth/song';
import { analysePcm } from '../../src/lib/tempo/resolve';
const rate = Number(process.env.RATE ?? 11025);
let a1 = 0,
	a2 = 0,
	n = 0,
	m = 0,
	off = 0;
const t0 = performance.now();
for (let i = 0; i < 48; i++) {
	const bpm = Math.round(60 + (140 * i) / 47);
	const meter = i % 2 ? 3 : 4;
	const swing = i % 3 === 0 ? 1 : i % 3 === 1 ? 0.5 : 0;
	const pad = i % 4 < 2;
	const noise = [0, 0.03, 0.1][i % 3];
	const s = generateSong({
		bpm,
		meter,
		durationS: 30,
		swing,
		pad,
		noise,
		seed: 100 + i,
		sampleRate: rate
	});
	const r = analysePcm(s.samples, rate);
	const ok1 = Math.abs(r.bpm / bpm - 1) <= 0.04;
	const ok2 = [1, 2, 3, 0.5, 1 / 3].some((k) => Math.abs(r.bpm / (bpm * k) - 1) <= 0.04);
	m += +(r.meter === meter);
	const beat = 60 / bpm;
	const d = Math.abs(((((r.offsetS - s.firstBeatS) % beat) + 1.5 * beat) % beat) - 0.5 * beat);
	if (ok1 && d < 0.03) off++;
	a1 += +ok1;
	a2 += +ok2;
	n++;
	if (!ok1 || process.argv[2])
		console.log(
			bpm,
			meter,
			'sw',
			swing,
			'pad',
			pad,
			'noise',
			noise,
			'->',
			r.bpm,
			'm',
			r.meter,
			'conf',
			r.confidence,
			'off',
			r.offsetS.toFixed(3),
			'true',
			s.firstBeatS % (60 / bpm),
			JSON.stringify(r.candidates.slice(0, 4))
		);
}
console.log(
	'meter',
	m / n,
	'offset<30ms',
	off / n,
	'acc1',
	a1 / n,
	'acc2',
	a2 / n,
	'ms/file',
	((performance.now() - t0) / n).toFixed(0)
);
