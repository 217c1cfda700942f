// Tempo candidates from the envelope's own autocorrelation, so resolution works (and is tested)
// without the browser's detector; detector guesses are added to these by the caller.
import { periodToBpm } from './comb';
import type { Envelope } from './onset';

export function autocorrelationBpms(
	env: Envelope,
	minBpm: number,
	maxBpm: number,
	count = 4
): number[] {
	const x = env.values;
	const n = x.length;
	let mean = 0;
	for (let i = 0; i < n; i++) mean += x[i];
	mean /= Math.max(1, n);
	const lo = Math.max(1, Math.floor((60 * env.frameRate) / maxBpm));
	const hi = Math.min(n - 2, Math.ceil((60 * env.frameRate) / minBpm));
	if (hi <= lo + 2) return [];
	const r = new Float64Array(hi + 2);
	for (let lag = lo - 1; lag <= hi + 1; lag++) {
		let s = 0;
		for (let i = lag; i < n; i++) s += (x[i] - mean) * (x[i - lag] - mean);
		r[lag] = s / (n - lag);
	}
	const peaks: { lag: number; value: number }[] = [];
	for (let lag = lo; lag <= hi; lag++) {
		if (r[lag] > 0 && r[lag] >= r[lag - 1] && r[lag] > r[lag + 1]) {
			// Parabolic interpolation between the neighbouring lags for a sub-frame period.
			const d = r[lag - 1] - 2 * r[lag] + r[lag + 1];
			const shift = d < 0 ? (0.5 * (r[lag - 1] - r[lag + 1])) / d : 0;
			peaks.push({ lag: lag + shift, value: r[lag] });
		}
	}
	peaks.sort((a, b) => b.value - a.value);
	return peaks.slice(0, count).map((p) => periodToBpm(p.lag, env.frameRate));
}
