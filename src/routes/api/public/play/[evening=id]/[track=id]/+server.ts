// A signed play link (see $lib/server/share/play-link): no session, so a playlist plays on
// the laptop at the venue. Refused when the tag does not fit (403), once expired (410 Gone:
// the link was good and is no more), and once the evening or the track in it is gone (410 too:
// the tag proves the track was in that evening when the link was made).
import { z } from 'zod';
import { publicRoute } from '$lib/server/guard';
import { badRequest } from '$lib/server/json-body';
import { appPlayKey, checkPlay } from '$lib/server/share/play-link';
import { playableTrack } from '$lib/server/share/play-track';
import { audioResponse } from '$lib/server/tracks/serve-audio';
import type { RequestHandler } from './$types';

// The route's [evening=id] and [track=id] matchers have already checked both ids.
const linkSchema = z.object({
	evening: z.coerce.number(),
	track: z.coerce.number(),
	expires: z
		.string()
		.regex(/^\d{1,12}$/)
		.transform(Number),
	sig: z.string().min(1).max(100)
});

export const GET = (async (event) => {
	publicRoute(event);
	const q = event.url.searchParams;
	const parsed = linkSchema.safeParse({
		...event.params,
		expires: q.get('expires') ?? undefined,
		sig: q.get('sig') ?? undefined
	});
	if (!parsed.success) return badRequest('This play link is incomplete.', 400);
	const { sig, evening, track, expires } = parsed.data;
	const link = { eveningId: evening, trackId: track, expires };
	const verdict = checkPlay(link, sig, appPlayKey(), Math.floor(Date.now() / 1000));
	if (verdict === 'forged') return badRequest('This play link is not valid.', 403);
	if (verdict === 'expired') {
		return badRequest('This play link has expired. Download the playlist again.', 410);
	}
	const row = playableTrack(evening, track);
	if (!row) return badRequest('This evening or this track in it is gone.', 410);
	// no-store: a copy kept by the player must not outlive the link's refusal.
	return audioResponse(row, event.request, 'private, no-store');
}) satisfies RequestHandler;
