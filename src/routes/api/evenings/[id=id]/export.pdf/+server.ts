import { buildPdf } from '$lib/server/share/pdf';
import { requireRight } from '$lib/server/guard';
import { download, readableSheet } from '$lib/server/share/access';
import type { RequestHandler } from './$types';

export const GET = (async (event) => {
	const sheet = readableSheet(requireRight(event, 'readEvenings'), event.params.id);
	const pdf = await buildPdf(sheet);
	return download(new Uint8Array(pdf), 'application/pdf', sheet, 'pdf');
}) satisfies RequestHandler;
