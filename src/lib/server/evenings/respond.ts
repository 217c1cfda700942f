// Route helpers: an evening id from the URL, and refusals as JSON `{ error }` with their status.
import { error, json } from '@sveltejs/kit';
import { idParam } from '../../route-id';
import { EveningError } from './errors';

/** The `[id]` parameter as a positive integer, or a 404. */
export function eveningIdOf(params: { id?: string }): number {
	const id = idParam(params.id);
	if (id === null) {
		error(404, { message: 'There is no such evening.', error: 'There is no such evening.' });
	}
	return id;
}

/** Runs `fn` (which may wait, as a plan in a worker does); an EveningError becomes its JSON
 * answer, anything else is rethrown. */
export async function answer(fn: () => Response | Promise<Response>): Promise<Response> {
	try {
		return await fn();
	} catch (e) {
		if (e instanceof EveningError)
			return json({ error: e.message, ...e.extra }, { status: e.status });
		throw e;
	}
}
