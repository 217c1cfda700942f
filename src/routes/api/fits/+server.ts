import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { badRequest, readJson } from '$lib/server/json-body';
import { setVerdict } from '$lib/server/fits/verdicts';
import { fitVerdictSchema } from '$lib/schemas/dance';
import type { RequestHandler } from './$types';

export const PUT = (async (event) => {
	const me = requireRight(event, 'fits');
	const body = await readJson(event.request, fitVerdictSchema);
	if (!body.ok) return body.response;
	const result = setVerdict(body.data, me.id);
	if (!result.ok) return badRequest(result.error, result.status);
	const { trackId, danceId, verdict, rate, notes, decidedBy, updatedAt } = result.fit;
	return json({ trackId, danceId, verdict, rate, notes, decidedBy, updatedAt });
}) satisfies RequestHandler;
