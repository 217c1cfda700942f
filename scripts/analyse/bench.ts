// npm run bench:analyse — speed and accuracy of the browser analysis on generated music.
// Speed: track duration ÷ analysis time (× real time), per file and overall (target ≥ 150×).
// Accuracy 1 and 2 as Gouyon et al., "An experimental comparison of audio tempo induction
// algorithms", IEEE TASLP 14(5), 2006 (targets: ≥ 90 % and ≥ 98 %). The true tempo of a 3/4
// song is its beat (quarter note). Songs are cached in the system's temp folder.
import { spawn } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { accuracy1, accuracy2 } from '../../src/lib/tempo/accuracy';
import { Analyser, type AnalysisLine } from './browser';
import { benchSet, type BenchSong } from './bench-set';

const dir = join(tmpdir(), 'floorset-bench-v1');
mkdirSync(dir, { recursive: true });
const songs = benchSet();

const t0 = performance.now();
const parts = 2;
const made = await Promise.all(
	Array.from({ length: parts }, (_, part) =>
		run(['bench-generate.ts', dir, String(part), String(parts)])
	)
);
const generated = made.map(
	(m) => JSON.parse(m || '{}') as { genMs: number; encMs: number; audioS: number }
);
const audioMade = generated.reduce((n, g) => n + (g.audioS ?? 0), 0);
if (audioMade > 0) {
	const wall = (performance.now() - t0) / 1000;
	console.log(
		`generated ${audioMade.toFixed(0)} s of audio in ${wall.toFixed(1)} s on ${parts} processes ` +
			`(synthesis ${sum(generated, 'genMs').toFixed(0)} ms, encoding ${sum(generated, 'encMs').toFixed(0)} ms of CPU)`
	);
}

const analyser = await Analyser.start();
const withDetector: AnalysisLine[] = [];
const ownOnly: AnalysisLine[] = [];
try {
	// One warm-up so the first file does not carry the page's start-up.
	await analyser.analyse(join(dir, songs[0].name));
	for (const s of songs) withDetector.push(await analyser.analyse(join(dir, s.name)));
	for (const s of songs) ownOnly.push(await analyser.analyse(join(dir, s.name), { windows: [] }));
} finally {
	await analyser.close();
}

const rows = songs.map((s, i) => row(s, withDetector[i]));
console.log('');
console.log(
	pad('file', 28) +
		pad('true', 7) +
		pad('m', 3) +
		pad('swing', 6) +
		pad('pad', 4) +
		pad('noise', 6) +
		pad('dur s', 6) +
		pad('bpm', 8) +
		pad('raw', 8) +
		pad('m', 3) +
		pad('conf', 6) +
		pad('ms', 6) +
		pad('×RT', 7) +
		'A1 A2'
);
for (const r of rows) console.log(r.text);

summary('resolved (detector + own candidates)', songs, withDetector, (l) => l.bpm);
summary('resolved (own candidates only, no detector)', songs, ownOnly, (l) => l.bpm);
summary('detector alone (default window 90–180)', songs, withDetector, (l) => l.rawBpm);

function row(s: BenchSong, l: AnalysisLine) {
	if (!l.ok) return { text: `${pad(s.name, 28)}FAILED: ${l.error}` };
	const rt = s.durationS / ((l.ms ?? 1) / 1000);
	const a1 = accuracy1(l.bpm ?? 0, s.bpm);
	const a2 = accuracy2(l.bpm ?? 0, s.bpm);
	return {
		text:
			pad(s.name, 28) +
			pad(s.bpm, 7) +
			pad(s.meter, 3) +
			pad(s.swing, 6) +
			pad(s.pad ? 'y' : '-', 4) +
			pad(s.noise, 6) +
			pad(s.durationS, 6) +
			pad(l.bpm, 8) +
			pad(l.rawBpm, 8) +
			pad(l.meter, 3) +
			pad(l.confidence, 6) +
			pad(l.ms, 6) +
			pad(rt.toFixed(0), 7) +
			(a1 ? 'y  ' : '-  ') +
			(a2 ? 'y' : '-')
	};
}

function summary(
	label: string,
	set: BenchSong[],
	lines: AnalysisLine[],
	pick: (l: AnalysisLine) => number | undefined
) {
	const ok = lines.filter((l) => l.ok).length;
	const a1 = set.filter((s, i) => lines[i].ok && accuracy1(pick(lines[i]) ?? 0, s.bpm)).length;
	const a2 = set.filter((s, i) => lines[i].ok && accuracy2(pick(lines[i]) ?? 0, s.bpm)).length;
	const meter = set.filter((s, i) => lines[i].meter === s.meter).length;
	const audio = set.reduce((n, s) => n + s.durationS, 0);
	const ms = lines.reduce((n, l) => n + (l.ms ?? 0), 0);
	const rts = set.map((s, i) => s.durationS / ((lines[i].ms ?? 1) / 1000)).sort((a, b) => a - b);
	const pct = (n: number) => `${((100 * n) / set.length).toFixed(1)} % (${n}/${set.length})`;
	console.log(`\n${label}`);
	console.log(`  files analysed   ${ok}/${set.length}`);
	console.log(`  Accuracy 1       ${pct(a1)}`);
	console.log(`  Accuracy 2       ${pct(a2)}`);
	if (label.startsWith('resolved')) console.log(`  meter right      ${pct(meter)}`);
	const stage = (k: string) =>
		(lines.reduce((n, l) => n + (l.timings?.[k] ?? 0), 0) / lines.length).toFixed(0);
	console.log(
		`  mean ms a file   tags ${stage('tagsMs')}, decode ${stage('decodeMs')}, detector ` +
			`${stage('detectMs')}, resolution ${stage('resolveMs')}`
	);
	console.log(
		`  speed            overall ${(audio / (ms / 1000)).toFixed(0)}× real time ` +
			`(${audio.toFixed(0)} s of audio in ${(ms / 1000).toFixed(2)} s); per file min ` +
			`${rts[0].toFixed(0)}×, median ${rts[rts.length >> 1].toFixed(0)}×, max ${rts[rts.length - 1].toFixed(0)}×`
	);
}

function run(args: string[]): Promise<string> {
	return new Promise((ok, fail) => {
		const child = spawn(
			process.execPath,
			['--import', 'tsx', join(import.meta.dirname, args[0]), ...args.slice(1)],
			{
				stdio: ['ignore', 'pipe', 'inherit']
			}
		);
		let out = '';
		child.stdout.on('data', (d) => (out += d));
		child.on('exit', (code) =>
			code === 0 ? ok(out.trim()) : fail(new Error(`generator exited ${code}`))
		);
	});
}

function sum<T>(xs: T[], key: keyof T): number {
	return xs.reduce((n, x) => n + (Number(x[key]) || 0), 0);
}

function pad(v: unknown, width: number): string {
	return String(v ?? '').padEnd(width);
}
