// In-place iterative radix-2 FFT (Cooley–Tukey); n must be a power of two. The bit-reversal
// order and twiddle factors are worked out once per size, since the onset envelope runs
// thousands of same-sized transforms per file.

interface Plan {
	reverse: Uint32Array;
	cos: Float64Array;
	sin: Float64Array;
}

const plans = new Map<number, Plan>();

function plan(n: number): Plan {
	let p = plans.get(n);
	if (p) return p;
	const bits = Math.log2(n);
	const reverse = new Uint32Array(n);
	for (let i = 0; i < n; i++) {
		let r = 0;
		for (let b = 0; b < bits; b++) r |= ((i >> b) & 1) << (bits - 1 - b);
		reverse[i] = r;
	}
	const cos = new Float64Array(n / 2);
	const sin = new Float64Array(n / 2);
	for (let k = 0; k < n / 2; k++) {
		cos[k] = Math.cos((-2 * Math.PI * k) / n);
		sin[k] = Math.sin((-2 * Math.PI * k) / n);
	}
	p = { reverse, cos, sin };
	plans.set(n, p);
	return p;
}

export function fft(re: Float64Array, im: Float64Array): void {
	const n = re.length;
	const { reverse, cos, sin } = plan(n);
	for (let i = 0; i < n; i++) {
		const j = reverse[i];
		if (i < j) {
			const tr = re[i];
			re[i] = re[j];
			re[j] = tr;
			const ti = im[i];
			im[i] = im[j];
			im[j] = ti;
		}
	}
	for (let len = 2; len <= n; len <<= 1) {
		const half = len >> 1;
		const step = n / len;
		for (let i = 0; i < n; i += len) {
			for (let k = 0; k < half; k++) {
				const a = i + k;
				const b = a + half;
				const wr = cos[k * step];
				const wi = sin[k * step];
				const tr = re[b] * wr - im[b] * wi;
				const ti = re[b] * wi + im[b] * wr;
				re[b] = re[a] - tr;
				im[b] = im[a] - ti;
				re[a] += tr;
				im[a] += ti;
			}
		}
	}
}
