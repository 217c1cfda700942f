import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { listPeople } from '$lib/server/users';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	requireRight(event, 'people');
	return json({ items: listPeople() });
}) satisfies RequestHandler;
