// Fills a database with an invented library for benchmarks: N tracks and M dances, all names
// made up from syllables. Tracks point at one real audio file so /audio works.
import type { Db } from '../../src/lib/server/db';
import { dances, tracks } from '../../src/lib/server/db/schema';
import { LEVELS, RHYTHMS } from '../../src/lib/domain';
import { seededRandom } from '../../src/lib/random';

const SYLLABLES = [
	'bra',
	'ken',
	'fol',
	'wren',
	'moor',
	'quil',
	'tan',
	'sy',
	'dor',
	'lin',
	'mar',
	'row'
];

const rng = seededRandom;

const word = (r: () => number) => {
	const n = 2 + Math.floor(r() * 2);
	const w = Array.from({ length: n }, () => SYLLABLES[Math.floor(r() * SYLLABLES.length)]).join('');
	return w[0].toUpperCase() + w.slice(1);
};

export function fillLibrary(
	db: Db,
	opts: { tracks: number; dances: number; storageKey: string; fileSize: number; seed?: number }
) {
	const r = rng(opts.seed ?? 7);
	db.transaction((tx) => {
		for (let i = 0; i < opts.tracks; i++) {
			const meter = r() < 0.15 ? 3 : 4;
			const bpm = Math.round((meter === 3 ? 78 + r() * 30 : 60 + r() * 140) * 10) / 10;
			tx.insert(tracks)
				.values({
					title: `${word(r)} ${word(r)}`,
					artist: `${word(r)} ${word(r)}`,
					album: word(r),
					durationS: 140 + r() * 120,
					bpm,
					rawBpm: bpm,
					bpmSource: 'detected',
					confidence: 0.5 + r() * 0.5,
					meter,
					phraseBeats: meter === 3 ? 24 : 32,
					mimeType: 'audio/mpeg',
					fileSize: opts.fileSize,
					sha256: 'b'.repeat(56) + i.toString(16).padStart(8, '0'),
					storageKey: opts.storageKey,
					format: 'MPEG 1 Layer 3'
				})
				.run();
		}
		for (let i = 0; i < opts.dances; i++) {
			const meter = r() < 0.15 ? 3 : 4;
			const min = meter === 3 ? 80 + Math.round(r() * 10) : 60 + Math.round(r() * 120);
			tx.insert(dances)
				.values({
					name: `${word(r)} ${word(r)}`,
					counts: [16, 32, 32, 32, 48, 64][Math.floor(r() * 6)],
					walls: ([1, 2, 4, 4] as const)[Math.floor(r() * 4)],
					level: LEVELS[Math.floor(r() * LEVELS.length)],
					rhythm: meter === 3 ? 'waltz' : RHYTHMS[Math.floor(r() * RHYTHMS.length)],
					meter,
					bpmMin: min,
					bpmMax: min + 12 + Math.round(r() * 14)
				})
				.run();
		}
	});
}
