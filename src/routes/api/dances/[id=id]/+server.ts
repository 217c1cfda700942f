import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { badRequest, readJson } from '$lib/server/json-body';
import { deleteDance, getDance, updateDance } from '$lib/server/dances/catalogue';
import { idParam } from '$lib/route-id';
import { forgetSheet } from '$lib/server/dances/step-sheet';
import { dancePatchSchema } from '$lib/schemas/dance';
import type { RequestHandler } from './$types';

const NO_DANCE = 'No such dance.';

export const GET = ((event) => {
	requireRight(event, 'readDances');
	const id = idParam(event.params.id);
	const dance = id ? getDance(id) : null;
	return dance ? json(dance) : badRequest(NO_DANCE, 404);
}) satisfies RequestHandler;

export const PATCH = (async (event) => {
	requireRight(event, 'dances');
	const id = idParam(event.params.id);
	if (!id) return badRequest(NO_DANCE, 404);
	const body = await readJson(event.request, dancePatchSchema);
	if (!body.ok) return body.response;
	const result = updateDance(id, body.data);
	if (!result.ok) {
		return badRequest(
			result.error,
			result.status,
			result.current ? { current: result.current } : {}
		);
	}
	return json(result.dance);
}) satisfies RequestHandler;

export const DELETE = (async (event) => {
	requireRight(event, 'dances');
	const id = idParam(event.params.id);
	const result = id ? deleteDance(id) : { deleted: false, sheetKey: null };
	if (!result.deleted) return badRequest(NO_DANCE, 404);
	await forgetSheet(result.sheetKey);
	return new Response(null, { status: 204 });
}) satisfies RequestHandler;
