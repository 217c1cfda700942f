// A stand-in for the plan route's module in plan-pool.test.ts: a "plan" that takes 300 ms of a
// worker thread and says which thread made it.
import { threadId } from 'node:worker_threads';

export function _planInWorker(input) {
	const until = Date.now() + 300;
	while (Date.now() < until) {
		/* busy, as a real plan is */
	}
	return { madeOnThread: threadId, evening: input.evening };
}
