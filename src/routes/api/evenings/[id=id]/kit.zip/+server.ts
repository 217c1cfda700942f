import { requireRight } from '$lib/server/guard';
import { readableSheet } from '$lib/server/share/access';
import { buildKit } from '$lib/server/share/kit';
import { fileStem } from '$lib/server/share/sheet';
import type { RequestHandler } from './$types';

export const GET = (async (event) => {
	// The kit holds the club's audio: only the people who play the night, drafts included.
	const sheet = readableSheet(requireRight(event, 'playNight'), event.params.id);
	const kit = await buildKit(sheet);
	return new Response(kit.body, {
		headers: {
			'content-type': 'application/zip',
			'content-length': String(kit.size),
			'content-disposition': `attachment; filename="${fileStem(sheet)}-kit.zip"`,
			'cache-control': 'private, no-store'
		}
	});
}) satisfies RequestHandler;
