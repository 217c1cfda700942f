import { threadId } from 'node:worker_threads';
import { afterAll, expect, test } from 'vitest';
import type { PlanInput } from '../../planner';
import { closePlanPool, planOffThread } from './plan-pool';

const worker = new URL('./plan-pool.fixture.mjs', import.meta.url).href;
const input = (evening: number) => ({ evening }) as unknown as PlanInput;
afterAll(() => closePlanPool());

test('a plan runs on another thread, and the server thread stays free meanwhile', async () => {
	let ticks = 0;
	const timer = setInterval(() => ticks++, 10);
	const result = (await planOffThread(1, input(1), worker)) as unknown as { madeOnThread: number };
	clearInterval(timer);
	expect(result.madeOnThread).not.toBe(threadId);
	// The 300 ms busy plan did not hold this thread: its timer kept running.
	expect(ticks).toBeGreaterThan(10);
});

test('one plan per evening at a time: a second is refused with 429, another evening is not', async () => {
	const first = planOffThread(2, input(2), worker);
	await expect(planOffThread(2, input(2), worker)).rejects.toMatchObject({ status: 429 });
	const other = planOffThread(3, input(3), worker);
	await expect(Promise.all([first, other])).resolves.toHaveLength(2);
	// Once the first is done the evening can be planned again.
	await expect(planOffThread(2, input(2), worker)).resolves.toBeTruthy();
});
