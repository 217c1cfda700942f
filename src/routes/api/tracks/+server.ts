import { json } from '@sveltejs/kit';
import { cachedJson } from '$lib/server/cache/cached-json';
import { requireRight } from '$lib/server/guard';
import { badRequest, describeIssue, refuseAfterDraining } from '$lib/server/json-body';
import {
	BadCursorError,
	listTracks,
	maxUploadBytes,
	tooLarge,
	uploadTrack
} from '$lib/server/tracks';
import { listQuerySchema } from '$lib/music/track-schemas';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	requireRight(event, 'readMusic');
	const parsed = listQuerySchema.safeParse(Object.fromEntries(event.url.searchParams));
	if (!parsed.success) return badRequest(describeIssue(parsed.error));
	try {
		return cachedJson(event.request, `tracks ${JSON.stringify(parsed.data)}`, () =>
			listTracks(parsed.data)
		)!;
	} catch (e) {
		if (e instanceof BadCursorError) return badRequest(e.message);
		throw e;
	}
}) satisfies RequestHandler;

// Room for the multipart envelope and the analysis field around the file itself.
const ENVELOPE_BYTES = 64 * 1024;

export const POST = (async (event) => {
	const user = requireRight(event, 'tracks');
	const type = event.request.headers.get('content-type') ?? '';
	if (!type.startsWith('multipart/form-data')) {
		return badRequest('Send the upload as multipart/form-data with a file and its analysis.', 415);
	}
	const length = Number(event.request.headers.get('content-length') ?? 0);
	if (length > maxUploadBytes() + ENVELOPE_BYTES) {
		const refused = tooLarge();
		const message = refused.ok ? '' : refused.error;
		return refuseAfterDraining(event.request, message, 413, { ok: false, status: 413 });
	}
	let form: FormData;
	try {
		form = await event.request.formData();
	} catch {
		return badRequest('The upload could not be read as multipart form data.');
	}
	const file = form.get('file');
	if (!(file instanceof File)) return badRequest('The upload has no file (the field is "file").');
	if (file.size > maxUploadBytes()) return json(tooLarge(), { status: 413 });
	const analysis = form.get('analysis');
	const result = await uploadTrack({
		bytes: new Uint8Array(await file.arrayBuffer()),
		fileName: file.name,
		analysis: typeof analysis === 'string' ? analysis : null,
		uploadedBy: user.id
	});
	if (!result.ok) return badRequest(result.error, result.status);
	return json(
		result.duplicate ? { duplicate: true, track: result.track } : { track: result.track },
		{ status: result.status }
	);
}) satisfies RequestHandler;
