// Writes part of the benchmark set into a folder: tsx bench-generate.ts DIR PART PARTS.
import { existsSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { encodeMp3 } from '../../src/lib/synth/mp3';
import { generateSong } from '../../src/lib/synth/song';
import { encodeWav } from '../../src/lib/synth/wav';
import { BENCH_KBPS, BENCH_RATE, benchSet } from './bench-set';

const [dir, part, parts] = [process.argv[2], Number(process.argv[3]), Number(process.argv[4])];
let genMs = 0;
let encMs = 0;
let audioS = 0;
benchSet().forEach((s, i) => {
	const path = join(dir, s.name);
	if (i % parts !== part || existsSync(path)) return;
	const t0 = performance.now();
	const song = generateSong({ ...s, sampleRate: BENCH_RATE });
	const t1 = performance.now();
	const bytes =
		s.format === 'mp3'
			? encodeMp3(song.samples, BENCH_RATE, BENCH_KBPS)
			: encodeWav(song.samples, BENCH_RATE);
	const t2 = performance.now();
	writeFileSync(path, bytes);
	genMs += t1 - t0;
	encMs += t2 - t1;
	audioS += s.durationS;
});
console.log(JSON.stringify({ part, genMs, encMs, audioS }));
