import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { readJson } from '$lib/server/json-body';
import { readsDrafts } from '$lib/server/evenings/access';
import { listEvenings, loadEvening } from '$lib/server/evenings/load';
import { answer } from '$lib/server/evenings/respond';
import { createEvening } from '$lib/server/evenings/write';
import { eveningCreate } from '$lib/schemas/evening';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const user = requireRight(event, 'readEvenings');
	return json({ items: listEvenings(!readsDrafts(user)) });
}) satisfies RequestHandler;

export const POST = (async (event) => {
	const user = requireRight(event, 'evenings');
	const body = await readJson(event.request, eveningCreate);
	if (!body.ok) return body.response;
	return answer(() => {
		const id = createEvening(body.data, user.id);
		return json(loadEvening(id), { status: 201, headers: { location: `/api/evenings/${id}` } });
	});
}) satisfies RequestHandler;
