import { error, fail } from '@sveltejs/kit';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '$lib/server/db';
import { tracks } from '$lib/server/db/schema';
import { requireRight } from '$lib/server/guard';
import { answerRequest, canAnswerRequests, listRequests } from '$lib/server/dances/requests';
import { fitsForDance } from '$lib/server/fits/ranking';
import { lineText } from '$lib/schemas/text';
import type { Actions, PageServerLoad } from './$types';

// "planned" is the request accepted: the planner puts it first in the request block.
const answerSchema = z.object({
	id: z.coerce.number().int().positive(),
	status: z.enum(['planned', 'declined', 'done', 'open'], {
		message: 'Choose accept, decline, done or reopen.'
	}),
	answer: lineText(300, 'answer').optional(),
	trackId: z.union([z.literal(''), z.coerce.number().int().positive()]).optional()
});

/** The few best tracks for a dance, for the answer's track choice. */
const TRACK_CHOICES = 8;

export const load = ((event) => {
	const me = requireRight(event, 'requests');
	const canAnswer = canAnswerRequests(me);
	const items = listRequests(me);
	const choices: Record<number, { id: number; title: string; artist: string }[]> = {};
	if (canAnswer) {
		for (const r of items) {
			if (r.kind !== 'dance' || !r.danceId || r.danceId in choices) continue;
			if (r.status !== 'open' && r.status !== 'planned') continue;
			choices[r.danceId] = (fitsForDance(r.danceId, TRACK_CHOICES)?.items ?? []).map((i) => ({
				id: i.track.id,
				title: i.track.title,
				artist: i.track.artist
			}));
		}
	}
	return { requests: items, canAnswer, choices };
}) satisfies PageServerLoad;

export const actions = {
	answer: async (event) => {
		const me = requireRight(event, 'requests');
		if (!canAnswerRequests(me)) error(403, 'Only the DJ or the organiser answers requests.');
		const form = await event.request.formData();
		const text = (k: string) => (typeof form.get(k) === 'string' ? String(form.get(k)) : undefined);
		const parsed = answerSchema.safeParse({
			id: form.get('id'),
			status: form.get('status'),
			answer: text('answer'),
			trackId: text('trackId')
		});
		if (!parsed.success) return fail(400, { message: parsed.error.issues[0]?.message });
		const { id, status, answer } = parsed.data;
		const trackId = parsed.data.trackId === undefined ? undefined : parsed.data.trackId || null;
		if (trackId) {
			const known = db().select({ id: tracks.id }).from(tracks).where(eq(tracks.id, trackId)).get();
			if (!known) return fail(400, { message: 'That track is not in the music library.' });
		}
		if (!answerRequest(id, { status, answer, trackId })) error(404, 'No such request.');
		return { answered: { id, status } };
	}
} satisfies Actions;
