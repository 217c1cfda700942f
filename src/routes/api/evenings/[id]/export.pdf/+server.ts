import { buildPdf } from '$lib/server/share/pdf';
import { download, readableSheet } from '$lib/server/share/access';
import type { RequestHandler } from './$types';

export const GET = (async (event) => {
	const { sheet } = readableSheet(event);
	const pdf = await buildPdf(sheet);
	return download(new Uint8Array(pdf), 'application/pdf', sheet.id, 'pdf');
}) satisfies RequestHandler;
