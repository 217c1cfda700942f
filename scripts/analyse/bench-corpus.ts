// npm run bench:analyse — tempo on the outside corpus (scripts/corpus/build.ts, music nobody on
// the team made), per source and overall, beside a general-purpose estimator from Debian
// (`aubio tempo`, aubio-tools) on the same files. Accuracy 1 and 2 as Gouyon et al., "An
// experimental comparison of audio tempo induction algorithms", IEEE TASLP 14(5), 2006.
// Targets (the issue): Accuracy 1 ≥ 90 %, Accuracy 2 ≥ 98 %, meter ≥ 95 % on the test half,
// ahead of aubio on each source, ≥ 150× real time. Also: the share of right tempi among the
// tracks marked sure and among those marked "check by ear".
// `npm run bench:analyse -- tune` reports the tuning half instead (the only half to tune on).
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { accuracy1, accuracy2 } from '../../src/lib/tempo/accuracy';
import { corpusDir, type CorpusEntry } from '../corpus/manifest';
import { Analyser, type AnalysisLine } from './browser';

const half = process.argv.includes('tune') ? 'tune' : 'test';
const dir = corpusDir();
const manifests = existsSync(dir)
	? readdirSync(dir).filter((f) => /^corpus-.*\.json$/.test(f))
	: [];
if (manifests.length === 0) {
	console.error(`no corpus in ${dir}: run npm run corpus:build first`);
	process.exit(2);
}
const set = manifests
	.flatMap((m) => JSON.parse(readFileSync(join(dir, m), 'utf8')) as CorpusEntry[])
	.filter((e) => e.split === half && existsSync(join(dir, 'audio', e.file)));

interface Row {
	e: CorpusEntry;
	ours: AnalysisLine;
	aubio: number | null;
}
const rows: Row[] = [];
const analyser = await Analyser.start();
try {
	await analyser.analyse(join(dir, 'audio', set[0].file)); // warm-up
	for (const e of set) {
		const path = join(dir, 'audio', e.file);
		rows.push({ e, ours: await analyser.analyse(path), aubio: aubioTempo(path) });
	}
} finally {
	await analyser.close();
}

console.log(`${half} half: ${set.length} files, ${new Set(set.map((e) => e.piece)).size} pieces\n`);
console.log(
	pad('file', 58) +
		pad('true', 8) +
		pad('m', 3) +
		pad('ours', 8) +
		pad('m', 3) +
		pad('alt', 8) +
		pad('aubio', 8) +
		'A1'
);
for (const r of rows)
	console.log(
		pad(r.e.file, 58) +
			pad(r.e.bpm, 8) +
			pad(r.e.meter ?? '-', 3) +
			pad(r.ours.ok ? r.ours.bpm : 'FAIL', 8) +
			pad(r.ours.meter ?? '', 3) +
			pad(r.ours.alternative ?? '', 8) +
			pad(r.aubio ?? 'FAIL', 8) +
			(r.ours.ok && accuracy1(r.ours.bpm ?? 0, r.e.bpm) ? 'y' : '-')
	);

const sources = [...new Set(rows.map((r) => r.e.source))].sort();
console.log(
	'\n' +
		pad('source', 10) +
		pad('files', 7) +
		pad('A1 ours', 10) +
		pad('A2 ours', 10) +
		pad('meter', 10) +
		pad('A1 aubio', 10) +
		'A2 aubio'
);
for (const s of [...sources, 'all'])
	summary(
		s,
		rows.filter((r) => s === 'all' || r.e.source === s)
	);

const ok = rows.filter((r) => r.ours.ok);
const sure = ok.filter((r) => r.ours.alternative === null);
const unsure = ok.filter((r) => r.ours.alternative !== null);
const right = (rs: Row[]) => rs.filter((r) => accuracy1(r.ours.bpm ?? 0, r.e.bpm)).length;
const either = (rs: Row[]) =>
	rs.filter((r) => [r.ours.bpm, r.ours.alternative].some((b) => b && accuracy1(b, r.e.bpm))).length;
console.log(`\nmarked sure:          ${pct(right(sure), sure.length)} right`);
console.log(
	`marked check by ear:  ${pct(right(unsure), unsure.length)} right as shown, ` +
		`${pct(either(unsure), unsure.length)} right in one of the two tempi offered`
);
const audio = ok.reduce((n, r) => n + (r.ours.durationS ?? 0), 0);
const ms = ok.reduce((n, r) => n + (r.ours.ms ?? 0), 0);
console.log(
	`speed:                ${(audio / (ms / 1000)).toFixed(0)}× real time over ${ok.length} files`
);

function summary(label: string, rs: Row[]) {
	const a1 = rs.filter((r) => r.ours.ok && accuracy1(r.ours.bpm ?? 0, r.e.bpm)).length;
	const a2 = rs.filter((r) => r.ours.ok && accuracy2(r.ours.bpm ?? 0, r.e.bpm)).length;
	const metered = rs.filter((r) => r.e.meter !== null);
	const m = metered.filter((r) => r.ours.meter === r.e.meter).length;
	const b1 = rs.filter((r) => r.aubio !== null && accuracy1(r.aubio, r.e.bpm)).length;
	const b2 = rs.filter((r) => r.aubio !== null && accuracy2(r.aubio, r.e.bpm)).length;
	console.log(
		pad(label, 10) +
			pad(rs.length, 7) +
			pad(pct(a1, rs.length), 10) +
			pad(pct(a2, rs.length), 10) +
			pad(pct(m, metered.length), 10) +
			pad(pct(b1, rs.length), 10) +
			pct(b2, rs.length)
	);
}

/** aubio's whole-file estimate: the last line of `aubio tempo` reads "N bpm". */
function aubioTempo(path: string): number | null {
	const r = spawnSync('aubio', ['tempo', '-i', path], { encoding: 'utf8' });
	const m = /([\d.]+) bpm/.exec(r.stdout ?? '');
	return r.status === 0 && m ? Number(m[1]) : null;
}

function pct(n: number, of: number): string {
	return of ? `${Math.round((100 * n) / of)} %` : '-';
}

function pad(v: unknown, width: number): string {
	return String(v ?? '').padEnd(width);
}
