import { buildCsv } from '$lib/server/share/csv';
import { requireRight } from '$lib/server/guard';
import { download, readableSheet } from '$lib/server/share/access';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const sheet = readableSheet(requireRight(event, 'readEvenings'), event.params.id);
	// RFC 4180 registers text/csv; the header parameter says the first line names the columns.
	return download(buildCsv(sheet), 'text/csv; charset=utf-8; header=present', sheet, 'csv');
}) satisfies RequestHandler;
