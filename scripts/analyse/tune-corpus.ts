// Tuning tool (not run by tests): the resolution's weights tried on the corpus's TUNING half
// only, in Node. The detector runs once per file in Chromium (its answers cached beside the
// corpus); the excerpt is cut and resampled here as the browser would (25 s in, 45 s long, at
// 12 kHz, by linear interpolation: close to, not the same as, the browser's decoder).
// `npx tsx scripts/analyse/tune-corpus.ts [verbose]`
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { accuracy1, accuracy2 } from '../../src/lib/tempo/accuracy';
import { onsetEnvelope, type Envelope } from '../../src/lib/tempo/onset';
import { resolveTempo } from '../../src/lib/tempo/resolve';
import { WEIGHTS } from '../../src/lib/tempo/score';
import { corpusDir, type CorpusEntry } from '../corpus/manifest';
import { Analyser } from './browser';

const dir = corpusDir();
const set = readdirSync(dir)
	.filter((f) => /^corpus-.*\.json$/.test(f))
	.flatMap((m) => JSON.parse(readFileSync(join(dir, m), 'utf8')) as CorpusEntry[])
	.filter((e) => e.split === 'tune' && existsSync(join(dir, 'audio', e.file)));

const cachePath = join(dir, 'detected-cache.json');
const cache: Record<string, number[]> = existsSync(cachePath)
	? JSON.parse(readFileSync(cachePath, 'utf8'))
	: {};
const todo = set.filter((e) => !cache[e.file]);
if (todo.length) {
	const analyser = await Analyser.start();
	try {
		for (const e of todo)
			cache[e.file] = (await analyser.analyse(join(dir, 'audio', e.file))).detected ?? [];
	} finally {
		await analyser.close();
	}
	writeFileSync(cachePath, JSON.stringify(cache));
}

const RATE = 12000;
const envs = new Map<string, Envelope>();
for (const e of set) envs.set(e.file, onsetEnvelope(excerpt(join(dir, 'audio', e.file)), RATE));

/** Mono PCM16 WAV → the browser's excerpt at 12 kHz. */
function excerpt(path: string): Float32Array {
	const b = readFileSync(path);
	let at = 12;
	let rate = 22050;
	while (at < b.length - 8) {
		const id = b.toString('ascii', at, at + 4);
		const size = b.readUInt32LE(at + 4);
		if (id === 'fmt ') rate = b.readUInt32LE(at + 12);
		if (id === 'data') {
			const n = Math.min(size, b.length - at - 8) >> 1;
			const x = new Float32Array(n);
			for (let i = 0; i < n; i++) x[i] = b.readInt16LE(at + 8 + 2 * i) / 32768;
			const durationS = n / rate;
			const startS = durationS > 56.25 ? Math.min(durationS * 0.25, 30, durationS - 45) : 0;
			const out = new Float32Array(Math.floor(Math.min(45, durationS - startS) * RATE));
			for (let i = 0; i < out.length; i++) {
				const t = (startS + i / RATE) * rate;
				const k = Math.floor(t);
				out[i] = x[k] + (x[Math.min(k + 1, n - 1)] - x[k]) * (t - k);
			}
			return out;
		}
		at += 8 + size + (size & 1);
	}
	throw new Error(`no data chunk in ${path}`);
}

function evaluate(verbose = false) {
	let a1 = 0,
		a2 = 0,
		m = 0,
		metered = 0;
	for (const e of set) {
		const r = resolveTempo(envs.get(e.file)!, { detected: cache[e.file] });
		const ok = accuracy1(r.bpm, e.bpm);
		a1 += +ok;
		a2 += +accuracy2(r.bpm, e.bpm);
		if (e.meter) {
			metered++;
			m += +(r.meter === e.meter);
		}
		if (verbose && !ok)
			console.log(
				e.file.padEnd(58),
				e.bpm,
				'→',
				r.bpm,
				'm',
				r.meter,
				JSON.stringify(r.candidates.slice(0, 3))
			);
	}
	const p = (n: number, d: number) => `${((100 * n) / d).toFixed(0)} %`;
	return `A1 ${p(a1, set.length)}  A2 ${p(a2, set.length)}  meter ${p(m, metered)}  (${set.length} files)`;
}

console.log('as shipped:', evaluate(process.argv.includes('verbose')));
const base = { ...WEIGHTS };
if (process.argv.includes('only')) process.exit(0);
for (const preferWidth of [0, 0.45, 0.9, 1.2, 1.5])
	for (const lift of [0, 0.35, 0.5, 0.7]) {
		Object.assign(WEIGHTS, base, { lift, preferWidth });
		console.log(`width ${preferWidth} lift ${lift}:`, evaluate());
	}
Object.assign(WEIGHTS, base);
