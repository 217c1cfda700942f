import { config } from '$lib/server/config';
import { buildIcs } from '$lib/server/share/ics';
import { requireRight } from '$lib/server/guard';
import { download, readableSheet } from '$lib/server/share/access';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	const sheet = readableSheet(requireRight(event, 'readEvenings'), event.params.id);
	const ics = buildIcs(sheet, { host: new URL(config().origin).hostname });
	// RFC 5545 §8.1 registers text/calendar.
	return download(ics, 'text/calendar; charset=utf-8', sheet, 'ics');
}) satisfies RequestHandler;
