// npm run corpus:build — the outside tempo corpus (issue "Tempo that dancers count"): music
// nobody on the team made, rendered to audio at a tempo written in its own file, from Debian
// packages. Audio never goes in git; this script rebuilds it (about 10 minutes on 2 cores).
//
// Sources (each a different kind of music and of author):
//   midi       MIDI files shipped in game and documentation packages, rendered with fluidsynth and
//              a General MIDI soundfont; the tempo is the files' own tempo events
//   abc        ABC tunes shipped with abcmidi, abcm2ps and texlive-music, rendered with abc2midi
//              (melody, with its chord accompaniment where the tune has chords) at a tempo set in Q:
//   hydrogen   Hydrogen's demo songs (drum patterns), rendered with h2cli at the song's <bpm>
//   lmms       LMMS's demo projects, rendered with `lmms -r` at the project's bpm
//   recorded   Frets on Fire's recorded songs, whose note charts carry the tempo
// Kept out, as the issue asks (the project's independent check is built from them):
// openttd-openmsx, planetblupi-music-midi, planetblupi-music-ogg, asc-music and mma's grooves.
//
// Every file is kept only if its tempo is steady (tempo events within 2 % of each other before
// the last tenth of the piece). Pieces are split once, by a hash of the piece's name, into a
// tuning half and a test half: every rendering of a piece falls in the same half.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import {
	existsSync,
	mkdirSync,
	readdirSync,
	readFileSync,
	rmSync,
	statSync,
	writeFileSync
} from 'node:fs';
import { basename, dirname, join, relative } from 'node:path';
import { inflateSync } from 'node:zlib';
import { corpusDir, type CorpusEntry } from './manifest';

const DIR = corpusDir();
const DEBS = join(DIR, 'debs');
const AUDIO = join(DIR, 'audio');
const WORK = join(DIR, 'work');
const SF2 = '/usr/share/sounds/sf2/FluidR3_GM.sf2';
const RATE = 22050;
/** Seconds kept of each rendering, from its very start (the first beat is checked too). */
const KEEP_S = 100;

const PACKAGES = [
	'simutrans-data',
	'freedink-data',
	'kobodeluxe-data',
	'pinball-table-hurd-data',
	'pianobooster',
	'songwrite',
	'csound-doc',
	'faust-common',
	'abcmidi',
	'abcm2ps',
	'texlive-music',
	'fretsonfire-songs-sectoid',
	'fretsonfire-songs-muldjord'
];
const TOOLS: Record<string, string> = {
	fluidsynth: 'fluidsynth',
	abc2midi: 'abcmidi',
	midicsv: 'midicsv',
	csvmidi: 'midicsv',
	sox: 'sox libsox-fmt-all',
	h2cli: 'hydrogen hydrogen-data',
	lmms: 'lmms lmms-common',
	aubio: 'aubio-tools'
};

function main() {
	const missing = Object.keys(TOOLS).filter((t) => spawnSync('which', [t]).status !== 0);
	if (missing.length || !existsSync(SF2)) {
		const pkgs = new Set([...missing.map((t) => TOOLS[t]), 'fluid-soundfont-gm']);
		console.error(`missing tools; install with: apt-get install -y ${[...pkgs].join(' ')}`);
		process.exit(2);
	}
	for (const d of [DEBS, AUDIO, WORK]) mkdirSync(d, { recursive: true });
	const roots = PACKAGES.map(unpack);
	// `npm run corpus:build -- lmms abc` builds only those sources (they can run side by side).
	const asked = process.argv.slice(2).filter((a) => a !== '--');
	const builders: Record<CorpusEntry['source'], () => CorpusEntry[]> = {
		midi: () => midiPieces(roots),
		abc: () => abcPieces(roots),
		hydrogen: hydrogenPieces,
		recorded: () => recordedPieces(roots),
		lmms: lmmsPieces
	};
	const entries: CorpusEntry[] = [];
	for (const [source, build] of Object.entries(builders)) {
		if (asked.length && !asked.includes(source)) continue;
		const made = build();
		writeFileSync(join(DIR, `corpus-${source}.json`), JSON.stringify(made, null, 1));
		entries.push(...made);
	}
	const pieces = new Set(entries.map((e) => e.piece));
	const bySource = count(entries, (e) => e.source);
	console.log(
		`${entries.length} files, ${pieces.size} pieces, ${Object.keys(bySource).length} sources ` +
			`(${Object.entries(bySource)
				.map(([s, n]) => `${s} ${n}`)
				.join(', ')}); tuning ${entries.filter((e) => e.split === 'tune').length}, ` +
			`test ${entries.filter((e) => e.split === 'test').length} → ${DIR}/corpus-*.json`
	);
}

function unpack(pkg: string): string {
	const root = join(DEBS, pkg);
	if (existsSync(root)) return root;
	execFileSync('apt-get', ['download', pkg], { cwd: DEBS, stdio: 'ignore' });
	const deb = readdirSync(DEBS).find((f) => f.startsWith(`${pkg}_`) && f.endsWith('.deb'));
	if (!deb) throw new Error(`apt-get download ${pkg} gave no .deb`);
	execFileSync('dpkg-deb', ['-x', join(DEBS, deb), root]);
	return root;
}

function walk(dir: string, test: (p: string) => boolean, out: string[] = []): string[] {
	if (!existsSync(dir)) return out;
	for (const name of readdirSync(dir).sort()) {
		const p = join(dir, name);
		if (statSync(p).isDirectory()) walk(p, test, out);
		else if (test(p)) out.push(p);
	}
	return out;
}

// ---- MIDI ----------------------------------------------------------------------------------

interface MidiTempo {
	/** Quarter notes a minute. */
	quarterBpm: number;
	num: number;
	den: number;
	/** Every time signature in the file is the same. */
	oneSignature: boolean;
	steady: boolean;
	seconds: number;
}

/** Tempo facts from midicsv's listing of a MIDI file. */
export function midiTempo(csv: string): MidiTempo | null {
	let division = 0;
	let end = 0;
	const tempi: { tick: number; us: number }[] = [];
	const sigs: { num: number; den: number }[] = [];
	for (const line of csv.split('\n')) {
		const f = line.split(',').map((s) => s.trim());
		const tick = Number(f[1]);
		if (f[2] === 'Header') division = Number(f[5]);
		else if (f[2] === 'Tempo') tempi.push({ tick, us: Number(f[3]) });
		else if (f[2] === 'Time_signature') sigs.push({ num: Number(f[3]), den: 2 ** Number(f[4]) });
		if (Number.isFinite(tick)) end = Math.max(end, tick);
	}
	if (division <= 0 || end <= 0) return null; // SMPTE time or empty
	if (tempi.length === 0) tempi.push({ tick: 0, us: 500000 }); // the MIDI default, 120 BPM
	tempi.sort((a, b) => a.tick - b.tick);
	const inBody = tempi.filter((t, i) => i === 0 || t.tick < 0.9 * end);
	const bpms = inBody.map((t) => 60e6 / t.us);
	const steady = Math.max(...bpms) / Math.min(...bpms) <= 1.02;
	// Seconds, summing each tempo's stretch.
	let seconds = 0;
	for (let i = 0; i < tempi.length; i++) {
		const to = i + 1 < tempi.length ? tempi[i + 1].tick : end;
		seconds += ((to - tempi[i].tick) / division) * (tempi[i].us / 1e6);
	}
	const sig = sigs[0] ?? { num: 4, den: 4 };
	return {
		quarterBpm: bpms[0],
		num: sig.num,
		den: sig.den,
		oneSignature: sigs.every((s) => s.num === sig.num && s.den === sig.den),
		steady,
		seconds
	};
}

/**
 * The beat a dancer counts and the bar's beats, from the time signature: the quarter note in
 * x/4 and x/2, the dotted quarter in compound time (3/8, 6/8, 9/8, 12/8). Meter 4 stands for any
 * duple grouping (2/4, 4/4, 6/8, 12/8), 3 for triple (3/4, 9/8); other signatures have no meter
 * to score. (Common practice in dance counting, no source.)
 */
export function countedBeat(
	quarterBpm: number,
	num: number,
	den: number
): { bpm: number; meter: 3 | 4 | null } {
	if (den === 8 && num % 3 === 0) {
		const beats = num / 3;
		return { bpm: (quarterBpm * 2) / 3, meter: beats === 3 ? 3 : beats % 2 === 0 ? 4 : null };
	}
	if (den === 4 || den === 2)
		return { bpm: quarterBpm, meter: num === 3 ? 3 : num === 2 || num === 4 ? 4 : null };
	return { bpm: quarterBpm, meter: null };
}

function midiPieces(roots: string[]): CorpusEntry[] {
	const files = roots
		.filter((r) => !/abc|fretsonfire|texlive/.test(r))
		.flatMap((r) => walk(r, (p) => /\.(mid|midi|kar)$/i.test(p)));
	const seen = new Set<string>();
	const out: CorpusEntry[] = [];
	for (const file of files) {
		const hash = sha(readFileSync(file)).toString('hex');
		const pkg = relative(DEBS, file).split('/')[0];
		const piece = `${pkg}/${basename(file).replace(/\.[^.]+$/, '')}`;
		// The same piece under two paths (faust ships its examples twice, a little apart).
		if (seen.has(hash) || seen.has(piece)) continue;
		seen.add(hash).add(piece);
		const t = midiTempo(execFileSync('midicsv', [file], { encoding: 'latin1' }));
		if (!t || !t.steady || t.seconds < 25) continue;
		const beat = countedBeat(t.quarterBpm, t.num, t.den);
		const name = `midi-${slug(piece)}.wav`;
		if (!render(name, (wav) => fluid(file, wav))) continue;
		out.push(entry(name, 'midi', piece, beat.bpm, t.oneSignature ? beat.meter : null));
	}
	return out;
}

/**
 * Renders a MIDI file's first KEEP_S seconds (and a little over): sox stops reading there, which
 * stops fluidsynth too (some files never end: a note left sounding keeps its player running).
 */
function fluid(mid: string, wav: string) {
	const q = (s: string) => `'${s.replace(/'/g, `'\\''`)}'`;
	const synth = `fluidsynth -ni -q -R 0 -C 0 -g 0.6 -r ${RATE} -T raw -O s16 -F - ${q(SF2)} ${q(mid)}`;
	const cut = `sox -t raw -r ${RATE} -e signed -b 16 -c 2 - -c 1 ${q(wav)} trim 0 ${KEEP_S + 5}`;
	spawnSync('bash', ['-c', `${synth} 2>/dev/null | ${cut}`], { stdio: 'ignore', timeout: 300_000 });
}

// ---- ABC -----------------------------------------------------------------------------------

interface AbcTune {
	x: string;
	title: string;
	meter: string;
	text: string;
}

export function abcTunes(text: string): AbcTune[] {
	const out: AbcTune[] = [];
	for (const block of text.split(/\n(?=X:)/)) {
		if (!/^X:/m.test(block)) continue;
		const x = /^X:\s*(\d+)/m.exec(block)?.[1];
		const meter = /^M:\s*(\S+)/m.exec(block)?.[1];
		if (!x || !meter || !/^\d+\/\d+$|^C\|?$/.test(meter)) continue;
		if (/^V:/m.test(block) && /%%score|%%staves/.test(block)) continue; // part-songs: skip
		const title = /^T:\s*(.+)$/m.exec(block)?.[1]?.trim() ?? `tune ${x}`;
		out.push({
			x,
			title,
			meter: meter === 'C' ? '4/4' : meter === 'C|' ? '2/2' : meter,
			text: block
		});
	}
	return out;
}

/** Two tempi a dance band might take each tune at (quarter or dotted-quarter beats a minute). */
function abcTempi(num: number, den: number): number[] {
	if (den === 8 && num % 3 === 0) return [104, 124];
	if (num === 3) return [88, 176]; // slow waltz and Viennese-speed waltz
	if (num === 2 && den === 4) return [116, 132]; // polka
	return [100, 136];
}

function abcPieces(roots: string[]): CorpusEntry[] {
	const files = roots
		.filter((r) => /abcmidi|abcm2ps|texlive-music/.test(r))
		.flatMap((r) => walk(r, (p) => /\.abc$/i.test(p)));
	const out: CorpusEntry[] = [];
	const seen = new Set<string>();
	for (const file of files) {
		for (const tune of abcTunes(readFileSync(file, 'latin1'))) {
			const body = tune.text.replace(/^[XTMLKQ]:.*$/gm, '').replace(/[^A-Ga-g]/g, '');
			if (body.length < 40) continue; // a snippet, not a tune
			const key = tune.title.toLowerCase();
			if (seen.has(key)) continue;
			seen.add(key);
			const [num, den] = tune.meter.split('/').map(Number);
			const piece = `abc/${basename(file, '.abc')}/${tune.x}-${tune.title}`;
			for (const bpm of abcTempi(num, den)) {
				const unit = den === 8 && num % 3 === 0 ? '3/8' : '1/4';
				// Q: after M: (abc2midi reads the header in order); any Q: the tune had is dropped.
				const text = tune.text
					.replace(/^Q:.*\n/gm, '')
					.replace(/^(M:.*)$/m, `$1\nQ:${unit}=${bpm}`);
				const abc = join(WORK, `${slug(piece)}-${bpm}.abc`);
				writeFileSync(abc, text);
				const mid = abc.replace(/\.abc$/, '.mid');
				spawnSync('abc2midi', [abc, tune.x, '-o', mid], { stdio: 'ignore' });
				if (!existsSync(mid)) continue;
				const t = midiTempo(execFileSync('midicsv', [mid], { encoding: 'latin1' }));
				if (!t || t.seconds < 12) continue;
				const name = `abc-${slug(piece)}-${bpm}.wav`;
				// Short tunes are looped to half a minute and more, as a band plays them through.
				const loops = Math.max(1, Math.ceil(40 / t.seconds));
				if (!render(name, (wav) => fluid(mid, wav), loops)) continue;
				const beat = countedBeat(t.quarterBpm, num, den);
				out.push(entry(name, 'abc', piece, beat.bpm, beat.meter));
			}
		}
	}
	return out;
}

// ---- Hydrogen ------------------------------------------------------------------------------

function hydrogenPieces(): CorpusEntry[] {
	const dir = '/usr/share/hydrogen/data/demo_songs';
	const out: CorpusEntry[] = [];
	for (const song of walk(dir, (p) => p.endsWith('.h2song'))) {
		const xml = readFileSync(song, 'utf8');
		const bpm = Number(/<bpm>([\d.]+)/.exec(xml)?.[1]);
		// 48 ticks a quarter note; the first pattern's size gives the bar.
		const size = Number(/<pattern>[\s\S]*?<size>(\d+)/.exec(xml)?.[1] ?? 192);
		const beats = size / 48;
		const meter = beats === 3 ? 3 : beats === 4 || beats === 2 ? 4 : null;
		const piece = `hydrogen/${basename(song, '.h2song')}`;
		// Each song also at 0.8× its tempo: the same grooves where a slower dance would use them.
		for (const k of [1, 0.8]) {
			const at = Math.round(bpm * k * 10) / 10;
			const copy = join(WORK, `${slug(piece)}-${at}.h2song`);
			writeFileSync(copy, xml.replace(/<bpm>[\d.]+/, `<bpm>${at}`));
			const name = `hydrogen-${slug(piece)}-${at}.wav`;
			const ok = render(name, (wav) =>
				spawnSync('h2cli', ['-s', copy, '-o', wav, '-r', String(44100)], {
					stdio: 'ignore',
					timeout: 300_000
				})
			);
			if (ok) out.push(entry(name, 'hydrogen', piece, at, meter));
		}
	}
	return out;
}

// ---- LMMS ----------------------------------------------------------------------------------

function lmmsPieces(): CorpusEntry[] {
	const dir = '/usr/share/lmms/projects';
	const out: CorpusEntry[] = [];
	for (const p of walk(dir, (f) => /\.mmpz?$/.test(f) && !f.includes('/templates/'))) {
		const raw = readFileSync(p);
		// .mmpz is Qt's qCompress: a 4-byte length, then zlib.
		const xml = p.endsWith('.mmpz')
			? inflateSync(raw.subarray(4)).toString('utf8')
			: raw.toString();
		const head = /<head\b[^>]*>/.exec(xml)?.[0] ?? '';
		const bpm = Number(/bpm="([\d.]+)"/.exec(head)?.[1]);
		const num = Number(/timesig_numerator="(\d+)"/.exec(head)?.[1] ?? 4);
		const den = Number(/timesig_denominator="(\d+)"/.exec(head)?.[1] ?? 4);
		// An automated tempo is saved as a <bpm> element instead of the attribute: such
		// projects change tempo and are left out.
		if (!bpm) continue;
		const piece = `lmms/${basename(p).replace(/\.mmpz?$/, '')}`;
		const name = `lmms-${slug(piece)}.wav`;
		const ok = render(name, (wav) =>
			spawnSync('lmms', ['--allowroot', '-r', p, '-f', 'wav', '-o', wav], {
				stdio: 'ignore',
				timeout: 240_000,
				env: { ...process.env, QT_QPA_PLATFORM: 'offscreen' }
			})
		);
		const beat = countedBeat(bpm, num, den);
		if (ok) out.push(entry(name, 'lmms', piece, beat.bpm, beat.meter));
	}
	return out;
}

// ---- Recorded (Frets on Fire) -------------------------------------------------------------

function recordedPieces(roots: string[]): CorpusEntry[] {
	const out: CorpusEntry[] = [];
	for (const notes of roots.flatMap((r) => walk(r, (p) => basename(p) === 'notes.mid'))) {
		const dir = dirname(notes);
		const t = midiTempo(execFileSync('midicsv', [notes], { encoding: 'latin1' }));
		if (!t || !t.steady) continue;
		const parts = ['song.ogg', 'guitar.ogg'].map((f) => join(dir, f)).filter(existsSync);
		if (parts.length === 0) continue;
		const piece = `recorded/${basename(dir)}`;
		const name = `recorded-${slug(piece)}.wav`;
		const ok = render(name, (wav) =>
			spawnSync('sox', parts.length > 1 ? ['-m', ...parts, wav] : [parts[0], wav], {
				stdio: 'ignore'
			})
		);
		const beat = countedBeat(t.quarterBpm, t.num, t.den);
		if (ok) out.push(entry(name, 'recorded', piece, beat.bpm, t.oneSignature ? beat.meter : null));
	}
	return out;
}

// ---- Shared --------------------------------------------------------------------------------

/** Renders once (cached), then keeps KEEP_S seconds, mono, at RATE, repeated `loops` times. */
function render(name: string, make: (wav: string) => unknown, loops = 1): boolean {
	const final = join(AUDIO, name);
	if (existsSync(final)) {
		// A file cut short (a full disk, a killed render) must not pass as cached.
		if (usable(final)) return true;
		rmSync(final);
	}
	const raw = join(WORK, `raw-${name}`);
	if (!existsSync(raw)) make(raw);
	if (!existsSync(raw) || statSync(raw).size < 10_000) return false;
	const args = [raw, '-c', '1', '-r', String(RATE), '-b', '16', final];
	if (loops > 1) args.push('repeat', String(loops - 1));
	args.push('trim', '0', String(KEEP_S), 'norm', '-1');
	const r = spawnSync('sox', args, { stdio: 'ignore' });
	if (r.status !== 0 || !existsSync(final)) return false;
	if (usable(final)) return true;
	rmSync(final);
	return false;
}

/** At least 20 s that is not mostly silence (a missing instrument is no test of anything). */
function usable(wav: string): boolean {
	const stat = spawnSync('sox', [wav, '-n', 'stat'], { encoding: 'utf8' }).stderr ?? '';
	const rms = Number(/RMS\s+amplitude:\s+([\d.]+)/.exec(stat)?.[1] ?? 0);
	const length = Number(/Length \(seconds\):\s+([\d.]+)/.exec(stat)?.[1] ?? 0);
	return rms > 0.01 && length >= 20;
}

function entry(
	file: string,
	source: CorpusEntry['source'],
	piece: string,
	bpm: number,
	meter: 3 | 4 | null
): CorpusEntry {
	const split = sha(Buffer.from(piece))[0] < 128 ? 'tune' : 'test';
	return { file, source, piece, bpm: Math.round(bpm * 100) / 100, meter, split };
}

const sha = (b: Buffer) => createHash('sha256').update(b).digest();
const slug = (s: string) =>
	s
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-|-$/g, '')
		.slice(0, 60);

function count<T>(xs: T[], key: (x: T) => string): Record<string, number> {
	const out: Record<string, number> = {};
	for (const x of xs) out[key(x)] = (out[key(x)] ?? 0) + 1;
	return out;
}

main();
