// One worker process of the demo audio generator: rhythm patterns at the song's tempo.
import { generateSong } from '../src/lib/synth/song';
import { writeId3 } from '../src/lib/synth/id3-node';
import { KBPS, SAMPLE_RATE, type AudioJob } from './audio';
import { encodeMp3Fast } from './encode-mp3';

process.on('message', async ({ index, track }: AudioJob) => {
	const song = generateSong({
		bpm: track.bpm,
		meter: track.meter,
		durationS: track.durationS,
		swing: track.swing,
		pad: track.pad,
		noise: 0.01,
		seed: index + 1,
		sampleRate: SAMPLE_RATE
	});
	const mp3 = await encodeMp3Fast(song.samples, song.sampleRate, KBPS);
	const bytes = writeId3(mp3, {
		title: track.title,
		artist: track.artist,
		album: track.album,
		bpm: track.bpm
	});
	process.send?.({ index, bytes });
});
