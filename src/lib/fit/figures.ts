// How many counts a footwork figure takes. Only what the trade states plainly is listed: "a
// shuffle is three steps in two counts" (REFERENCES.md, music structure — common practice).

/** A shuffle (triple step) puts three weight changes into two counts: 1 & 2. */
export const STEPS_IN_SHUFFLE = 3;
export const COUNTS_PER_SHUFFLE = 2;

export interface Figure {
	steps: number;
	counts: number;
}

export const FIGURES = {
	/** One weight change on one count. */
	step: { steps: 1, counts: 1 },
	/** No weight change for one count. */
	hold: { steps: 0, counts: 1 },
	shuffle: { steps: STEPS_IN_SHUFFLE, counts: COUNTS_PER_SHUFFLE }
} as const satisfies Record<string, Figure>;

export type FigureName = keyof typeof FIGURES;

/** Counts taken by a run of figures, e.g. to check a written section adds up to 8. */
export function countsOfFigures(figures: readonly FigureName[]): number {
	let counts = 0;
	for (const name of figures) counts += FIGURES[name].counts;
	return counts;
}

/** Weight changes in a run of figures. */
export function stepsOfFigures(figures: readonly FigureName[]): number {
	let steps = 0;
	for (const name of figures) steps += FIGURES[name].steps;
	return steps;
}

/** Seconds that `counts` counts last at a count tempo: one count is one beat, 60 ÷ bpm seconds. */
export function secondsForCounts(counts: number, bpm: number): number {
	return (counts * 60) / bpm;
}

/** Seconds one shuffle takes at a count tempo — what a lesson slowdown buys new feet. */
export function shuffleSeconds(bpm: number): number {
	return secondsForCounts(COUNTS_PER_SHUFFLE, bpm);
}
