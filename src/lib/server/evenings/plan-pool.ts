// Planning takes up to a second of CPU for a long evening. On the server's own thread that second
// stalls every other request (ten plans at once held the public page for 10 s), so plans run in a
// pool of worker threads (piscina), one plan per evening at a time. The worker's code is the
// plan route's module itself: its `_planInWorker` export (SvelteKit allows `_` exports in
// +server files), found by the route's own `import.meta.url`, so the build needs no extra entry.
// The Vite dev server's modules are not plain files a worker can load: there, plans run in place.
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { planEvening, type PlanInput, type PlanResult } from '../../planner';
import { EveningError } from './errors';

/** Plans waiting for a thread beyond this are refused: a club needs a handful at once. */
const MAX_WAITING = 32;

let pool: Piscina | undefined;

function poolFor(workerUrl: string): Piscina {
	pool ??= new Piscina({
		filename: workerUrl,
		name: '_planInWorker',
		// Keep one core for the server's own requests.
		maxThreads: Math.max(1, availableParallelism() - 1),
		minThreads: 0,
		idleTimeout: 30_000,
		maxQueue: MAX_WAITING
	});
	return pool;
}

const planning = new Set<number>();

/**
 * The plan for `input`, made off the server's thread when `workerUrl` is a built module (null
 * runs it here). One plan per evening at a time: a second is refused with 429 until the first
 * is done.
 */
export async function planOffThread(
	eveningId: number,
	input: PlanInput,
	workerUrl: string | null
): Promise<PlanResult> {
	if (planning.has(eveningId)) {
		throw new EveningError(
			'This evening is being planned already; try again when that plan is ready.',
			429
		);
	}
	planning.add(eveningId);
	try {
		if (!workerUrl) return planEvening(input);
		const p = poolFor(workerUrl);
		if (p.queueSize >= MAX_WAITING) {
			throw new EveningError(
				'The planner is busy with other evenings; try again in a minute.',
				503
			);
		}
		return (await p.run(input)) as PlanResult;
	} finally {
		planning.delete(eveningId);
	}
}

/** Stops the threads (at shutdown, so the process can exit). */
export async function closePlanPool(): Promise<void> {
	const p = pool;
	pool = undefined;
	await p?.destroy();
}
