import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { readJson } from '$lib/server/json-body';
import { describeEntries } from '$lib/server/evenings/describe';
import { planFor } from '$lib/server/evenings/plan';
import { answer, eveningIdOf } from '$lib/server/evenings/respond';
import { planRequest } from '$lib/schemas/evening';
import type { RequestHandler } from './$types';

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
	return answer(() => {
		const result = planFor(id, seed, entries ? { entries } : undefined);
		return json({ ...result, entries: describeEntries(result.entries) });
	});
}) satisfies RequestHandler;
