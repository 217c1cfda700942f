import { json } from '@sveltejs/kit';
import { dev } from '$app/environment';
import { requireRight } from '$lib/server/guard';
import { readJson } from '$lib/server/json-body';
import { describeEntries } from '$lib/server/evenings/describe';
import { planInputFor } from '$lib/server/evenings/plan';
import { planOffThread } from '$lib/server/evenings/plan-pool';
import { answer, eveningIdOf } from '$lib/server/evenings/respond';
import { planEvening, type PlanInput } from '$lib/planner';
import { planRequest } from '$lib/schemas/evening';
import type { RequestHandler } from './$types';

/** Run in a worker thread by the plan pool (plan-pool.ts): the planner alone, no database. */
export function _planInWorker(input: PlanInput) {
	return planEvening(input);
}

/**
 * A proposal only: saving it is a separate PUT of the run order (with its version). `entries`,
 * when sent, is the editor's unsaved run order: its locked entries are kept instead of the saved.
 */
export const POST = (async (event) => {
	requireRight(event, 'evenings');
	const id = eveningIdOf(event.params);
	const body = await readJson(event.request, planRequest);
	if (!body.ok) return body.response;
	const { seed, entries } = body.data;
	return answer(async () => {
		const input = planInputFor(id, seed, entries ? { entries } : undefined);
		const result = await planOffThread(id, input, dev ? null : import.meta.url);
		return json({ ...result, entries: describeEntries(result.entries) });
	});
}) satisfies RequestHandler;
