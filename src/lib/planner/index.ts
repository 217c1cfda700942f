// The evening planner: greedy construction, then simulated annealing, then the explanation.
// Pure and deterministic: the same input and seed give the same plan (the iteration budget binds;
// settings.timeBudgetMs is only a safety net for a machine that is far too busy).
//
// Usage from a route: map the evening, catalogue, tracks and fits to PlanInput, then
//   const result = planEvening({ evening, dances, tracks, fits, requests, mustPlay, neverPlay,
//     locked, settings, seed });
// result.entries is the run order (start times in seconds from the evening's start); locked
// entries keep their startS exactly. checkRunOrder(input, entries) checks a hand-edited order.
import { anneal } from './anneal';
import { construct } from './construct';
import { toEntries } from './explain';
import type { Plan, Problem } from './model';
import { evaluate } from './objective';
import { prepare } from './prepare';
import { createRng } from './rng';
import { checkHardRules } from './rules';
import { resolveSettings } from './settings';
import type { PlanInput, PlanResult } from './types';
import { unmetPreferences } from './unmet';

export type * from './types';
export { DEFAULT_SETTINGS, DEFAULT_WEIGHTS } from './settings';
export { fitIsPlayable } from './prepare';

/** Iterations for an evening of this size: a few hundred tries per movable entry, capped so a
 * four-hour evening plans in well under the benchmark's 300 ms on a two-core machine. */
function defaultIterations(plan: Plan): number {
	let movable = 0;
	for (const s of plan) if (s.kind === 'dance') movable += s.items.length;
	return Math.min(12_000, Math.max(2_000, movable * 300));
}

function finish(problem: Problem, plan: Plan, t0: number, stats: PlanResult['stats']): PlanResult {
	const { total, terms } = evaluate(problem, plan);
	return {
		entries: toEntries(problem, plan),
		objective: { total, terms },
		unmet: unmetPreferences(problem, plan),
		violations: [...new Set([...problem.inputViolations, ...checkHardRules(problem, plan)])],
		ms: performance.now() - t0,
		stats
	};
}

/** Plans the evening: the run order, the objective's terms, what it could not meet and why. */
export function planEvening(input: PlanInput): PlanResult {
	const t0 = performance.now();
	const settings = resolveSettings(input);
	const problem = prepare(input, settings);
	const greedy = construct(problem, input.locked ?? []);
	const greedyTotal = evaluate(problem, greedy).total;
	const iterations = settings.iterations ?? defaultIterations(greedy);
	const rng = createRng(settings.seed);
	const result = anneal(problem, greedy, rng, iterations, settings.timeBudgetMs);
	return finish(problem, result.plan, t0, {
		iterations: result.iterations,
		stoppedBy: result.stoppedBy,
		greedyTotal,
		seed: settings.seed
	});
}

/** The greedy construction alone: the baseline the benchmark compares the optimiser with. */
export function plainGreedy(input: PlanInput): PlanResult {
	const t0 = performance.now();
	const settings = resolveSettings(input);
	const problem = prepare(input, settings);
	const plan = construct(problem, input.locked ?? []);
	const greedyTotal = evaluate(problem, plan).total;
	return finish(problem, plan, t0, {
		iterations: 0,
		stoppedBy: 'greedy',
		greedyTotal,
		seed: settings.seed
	});
}
export { checkRunOrder, type RunOrderProblem } from './check';
