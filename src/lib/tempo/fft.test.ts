import { describe, expect, it } from 'vitest';
import { fft } from './fft';

// The discrete Fourier transform's definition, X[k] = Σ x[t]·e^(−2πikt/n), computed directly.
function dft(x: number[]): { re: number[]; im: number[] } {
	const n = x.length;
	const re: number[] = [];
	const im: number[] = [];
	for (let k = 0; k < n; k++) {
		let r = 0;
		let i = 0;
		for (let t = 0; t < n; t++) {
			r += x[t] * Math.cos((-2 * Math.PI * k * t) / n);
			i += x[t] * Math.sin((-2 * Math.PI * k * t) / n);
		}
		re.push(r);
		im.push(i);
	}
	return { re, im };
}

describe('fft', () => {
	it('matches the DFT definition', () => {
		const x = Array.from({ length: 64 }, (_, t) => Math.sin(t * 0.7) + (t % 5) * 0.1);
		const re = Float64Array.from(x);
		const im = new Float64Array(64);
		fft(re, im);
		const want = dft(x);
		for (let k = 0; k < 64; k++) {
			expect(re[k]).toBeCloseTo(want.re[k], 9);
			expect(im[k]).toBeCloseTo(want.im[k], 9);
		}
	});

	it('puts a pure tone in its bin (n/2 · amplitude)', () => {
		const n = 256;
		const re = Float64Array.from({ length: n }, (_, t) => Math.cos((2 * Math.PI * 10 * t) / n));
		const im = new Float64Array(n);
		fft(re, im);
		expect(re[10]).toBeCloseTo(n / 2, 9);
		expect(Math.abs(re[11])).toBeLessThan(1e-9);
	});
});
