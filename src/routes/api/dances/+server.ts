import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { badRequest, describeIssue, readJson } from '$lib/server/json-body';
import { createDance, listDances } from '$lib/server/dances/catalogue';
import { danceFilterSchema, danceSchema } from '$lib/schemas/dance';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	requireRight(event, 'readDances');
	const query = Object.fromEntries(
		[...event.url.searchParams].filter(([k, v]) => v !== '' && k in danceFilterSchema.shape)
	);
	const filter = danceFilterSchema.safeParse(query);
	if (!filter.success) return badRequest(describeIssue(filter.error), 422);
	return json({ items: listDances(filter.data) });
}) satisfies RequestHandler;

export const POST = (async (event) => {
	const me = requireRight(event, 'dances');
	const body = await readJson(event.request, danceSchema);
	if (!body.ok) return body.response;
	const dance = createDance(body.data, me.id);
	return json(dance, { status: 201, headers: { location: `/api/dances/${dance.id}` } });
}) satisfies RequestHandler;
