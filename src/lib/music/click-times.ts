// Where the click-along sounds: the beat grid (first beat at offsetS, one every 60/bpm s),
// with count 1 of each bar marked so the ear hears the bar as well as the beat.

export interface Click {
	atS: number;
	downbeat: boolean;
}

/** The clicks at or after `fromS` and before `toS`, in track time. */
export function clicksBetween(
	fromS: number,
	toS: number,
	grid: { bpm: number; offsetS: number; meter: number }
): Click[] {
	const beat = 60 / grid.bpm;
	const out: Click[] = [];
	for (let k = Math.max(0, Math.ceil((fromS - grid.offsetS) / beat - 1e-9)); ; k++) {
		const atS = grid.offsetS + k * beat;
		if (atS >= toS) break;
		out.push({ atS, downbeat: k % grid.meter === 0 });
	}
	return out;
}
