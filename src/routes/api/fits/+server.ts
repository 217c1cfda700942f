import { json } from '@sveltejs/kit';
import { z } from 'zod';
import { requireRight } from '$lib/server/guard';
import { badRequest, describeIssue, readJson } from '$lib/server/json-body';
import { clearVerdict, setVerdict, setVerdicts } from '$lib/server/fits/verdicts';
import { fitPairSchema, fitVerdictBulkSchema, fitVerdictSchema } from '$lib/schemas/dance';
import type { fits } from '$lib/server/db/schema';
import type { RequestHandler } from './$types';

const shape = ({
	trackId,
	danceId,
	verdict,
	rate,
	notes,
	decidedBy,
	updatedAt
}: typeof fits.$inferSelect) => ({ trackId, danceId, verdict, rate, notes, decidedBy, updatedAt });

/**
 * { trackId, danceId, verdict, rate?, notes? } sets one verdict; { trackIds: [...], danceId, … }
 * sets the same verdict for several tracks at once (all or nothing) and answers { items }.
 */
export const PUT = (async (event) => {
	const me = requireRight(event, 'fits');
	const body = await readJson(
		event.request,
		z.record(z.string(), z.unknown(), { message: 'Send a JSON object.' })
	);
	if (!body.ok) return body.response;
	if ('trackIds' in body.data) {
		const bulk = fitVerdictBulkSchema.safeParse(body.data);
		if (!bulk.success) return badRequest(describeIssue(bulk.error), 422);
		const result = setVerdicts(bulk.data, me.id);
		if (!result.ok) return badRequest(result.error, result.status);
		return json({ items: result.fits.map(shape) });
	}
	const one = fitVerdictSchema.safeParse(body.data);
	if (!one.success) return badRequest(describeIssue(one.error), 422);
	const result = setVerdict(one.data, me.id);
	if (!result.ok) return badRequest(result.error, result.status);
	return json(shape(result.fit));
}) satisfies RequestHandler;

/** { trackId, danceId } clears the team's verdict on the pair ("not judged" again). */
export const DELETE = (async (event) => {
	requireRight(event, 'fits');
	const body = await readJson(event.request, fitPairSchema);
	if (!body.ok) return body.response;
	if (!clearVerdict(body.data.trackId, body.data.danceId))
		return badRequest('The team has no verdict on this pair.', 404);
	return json({ trackId: body.data.trackId, danceId: body.data.danceId, verdict: null });
}) satisfies RequestHandler;
