// A waveform overview: the loudest sample (absolute) in each of `bins` equal slices of the
// audio, scaled so the loudest slice is 1. Pure, so it is tested without a browser.
export function peaks(samples: Float32Array, bins: number): Float32Array {
	const out = new Float32Array(Math.max(0, bins));
	if (bins <= 0 || samples.length === 0) return out;
	const per = samples.length / bins;
	let loudest = 0;
	for (let b = 0; b < bins; b++) {
		const from = Math.floor(b * per);
		const to = Math.max(from + 1, Math.floor((b + 1) * per));
		let m = 0;
		for (let i = from; i < to && i < samples.length; i++) m = Math.max(m, Math.abs(samples[i]));
		out[b] = m;
		loudest = Math.max(loudest, m);
	}
	if (loudest > 0) for (let b = 0; b < bins; b++) out[b] /= loudest;
	return out;
}
