import { requireRight } from '$lib/server/guard';
import { badRequest } from '$lib/server/json-body';
import { danceRow } from '$lib/server/dances/catalogue';
import { idParam } from '$lib/route-id';
import { storage } from '$lib/server/storage';
import type { RequestHandler } from './$types';

export const GET = (async (event) => {
	requireRight(event, 'readDances');
	const id = idParam(event.params.id);
	const row = id ? danceRow(id) : undefined;
	if (!row?.stepSheetKey) return badRequest('This dance has no step sheet.', 404);
	const size = await storage().size(row.stepSheetKey);
	if (size == null) return badRequest('The step sheet file is missing.', 404);
	// RFC 6266: an ASCII fallback name plus the UTF-8 one (RFC 8187).
	const name = row.stepSheetName ?? 'step-sheet.pdf';
	const ascii = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
	return new Response(storage().read(row.stepSheetKey), {
		headers: {
			'content-type': 'application/pdf',
			'content-length': String(size),
			// An uploaded PDF may carry scripts: never run it as a page of our origin. A download
			// opens in the reader's own PDF viewer; the sandbox covers any browser that renders it.
			'content-disposition': `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`,
			'content-security-policy': 'sandbox',
			'cache-control': 'private, max-age=300'
		}
	});
}) satisfies RequestHandler;
