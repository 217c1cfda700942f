import { requireRight } from '$lib/server/guard';
import { listDances } from '$lib/server/dances/catalogue';
import { danceCsv } from '$lib/server/dances/csv';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	requireRight(event, 'readDances');
	const day = new Date().toISOString().slice(0, 10);
	// RFC 4180 §3 registers text/csv; header=present says the first record names the columns.
	return new Response(danceCsv(listDances()), {
		headers: {
			'content-type': 'text/csv; charset=utf-8; header=present',
			'content-disposition': `attachment; filename="floorset-dances-${day}.csv"`
		}
	});
}) satisfies RequestHandler;
