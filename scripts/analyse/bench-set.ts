// The benchmark's generated music: 36 songs of known tempo across 60–200 BPM, both meters,
// straight and swung, with and without a pad, with and without noise; mostly MP3 as the demo
// seed makes them, some WAV. Seeds differ from the ones the weights were tuned on
// (scripts/analyse/dev-*.ts use 100–195 and 500–595).
import type { Meter } from '../../src/lib/domain';

export interface BenchSong {
	name: string;
	bpm: number;
	meter: Meter;
	swing: number;
	pad: boolean;
	noise: number;
	durationS: number;
	format: 'mp3' | 'wav';
	seed: number;
}

export const BENCH_RATE = 22050;
export const BENCH_KBPS = 40;

export function benchSet(count = 36): BenchSong[] {
	return Array.from({ length: count }, (_, i) => {
		// Tempi spread evenly, shuffled across the other settings by a stride prime to count.
		const bpm = Math.round((60 + (140 * ((i * 7) % count)) / (count - 1)) * 10) / 10;
		const meter: Meter = i % 2 ? 3 : 4;
		const swing = [0, 0.5, 1][i % 3];
		const pad = i % 4 >= 2;
		const noise = [0, 0.03, 0.08][Math.floor(i / 4) % 3];
		const durationS = 150 + ((i * 17) % 91);
		const format = i % 6 === 5 ? 'wav' : 'mp3';
		const name = `song-${String(i).padStart(2, '0')}-${bpm}bpm-${meter}4.${format}`;
		return { name, bpm, meter, swing, pad, noise, durationS, format, seed: 9000 + i };
	});
}
