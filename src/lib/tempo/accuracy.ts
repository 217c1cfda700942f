// Tempo evaluation as in Gouyon, Klapuri, Dixon, Alonso, Tzanetakis, Uhle, Cano, "An
// experimental comparison of audio tempo induction algorithms", IEEE TASLP 14(5), 2006:
// Accuracy 1 counts an estimate within 4 % of the true tempo; Accuracy 2 also counts one within
// 4 % of the true tempo × 2, × 3, × ½ or × ⅓.

export const TOLERANCE = 0.04;

export const withinTolerance = (estimate: number, truth: number, tol = TOLERANCE): boolean =>
	Math.abs(estimate - truth) <= tol * truth;

export const accuracy1 = (estimate: number, truth: number): boolean =>
	withinTolerance(estimate, truth);

export const accuracy2 = (estimate: number, truth: number): boolean =>
	[1, 2, 3, 1 / 2, 1 / 3].some((k) => withinTolerance(estimate, truth * k));
