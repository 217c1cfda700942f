import { error, fail } from '@sveltejs/kit';
import { z } from 'zod';
import { requireRight } from '$lib/server/guard';
import { canAnswerRequests, listRequests, setRequestStatus } from '$lib/server/dances/requests';
import type { Actions, PageServerLoad } from './$types';

const answerSchema = z.object({
	id: z.coerce.number().int().positive(),
	status: z.enum(['done', 'declined', 'open'], { message: 'Choose done, declined or reopen.' })
});

export const load = ((event) => {
	const me = requireRight(event, 'requests');
	return { requests: listRequests(me), canAnswer: canAnswerRequests(me) };
}) satisfies PageServerLoad;

export const actions = {
	answer: async (event) => {
		const me = requireRight(event, 'requests');
		if (!canAnswerRequests(me)) error(403, 'Only the DJ or the organiser answers requests.');
		const form = await event.request.formData();
		const parsed = answerSchema.safeParse({ id: form.get('id'), status: form.get('status') });
		if (!parsed.success) return fail(400, { message: parsed.error.issues[0]?.message });
		if (!setRequestStatus(parsed.data.id, parsed.data.status)) error(404, 'No such request.');
		return { answered: parsed.data };
	}
} satisfies Actions;
