import { error, fail } from '@sveltejs/kit';
import { z } from 'zod';
import { LEVEL_LABELS, LEVELS, type Level } from '$lib/domain';
import { DEFAULT_LESSON_SETTINGS, lessonTarget } from '$lib/fit';
import { holds, requireRight } from '$lib/server/guard';
import { idParam } from '$lib/route-id';
import { getDance } from '$lib/server/dances/catalogue';
import { openSlowerMusicRequests, requestSlowerMusic } from '$lib/server/dances/requests';
import { lessonMusic } from '$lib/server/fits/lesson';
import { lessonSettings } from '$lib/server/fits/settings';
import { fitsForDance } from '$lib/server/fits/ranking';
import { setVerdict } from '$lib/server/fits/verdicts';
import { fitVerdictSchema } from '$lib/schemas/dance';
import { blockText } from '$lib/schemas/text';
import type { Actions, PageServerLoad } from './$types';

/** Tracks shown in the fits table; the API gives more with ?limit=. */
const SHOWN = 30;

const requestSchema = z.object({
	message: blockText(500, 'message').trim(),
	/** The crowd's level the lesson music was shown for: the request names its target tempo. */
	level: z.enum(LEVELS).optional()
});

export const load = ((event) => {
	const me = requireRight(event, 'readDances');
	const id = idParam(event.params.id);
	const fits = id ? fitsForDance(id, SHOWN) : null;
	if (!fits) error(404, 'No such dance.');
	const asked = event.url.searchParams.get('level');
	const level: Level = (LEVELS as readonly string[]).includes(asked ?? '')
		? (asked as Level)
		: 'beginner';
	const canReadMusic = holds(me, 'readMusic');
	return {
		dance: fits.dance,
		// The fits carry the team's verdicts on the library: dancers see the dance, not them.
		items: canReadMusic ? fits.items : [],
		level,
		slowdowns: DEFAULT_LESSON_SETTINGS.slowdownByLevel,
		lesson: canReadMusic ? lessonMusic(fits, level) : null,
		requests: openSlowerMusicRequests(fits.dance.id).map((r) => ({
			id: r.id,
			message: r.message,
			requesterName: r.requesterName,
			createdAt: r.createdAt.toISOString()
		})),
		can: {
			edit: holds(me, 'dances'),
			judge: holds(me, 'fits'),
			listen: canReadMusic,
			request: holds(me, 'dances')
		}
	};
}) satisfies PageServerLoad;

export const actions = {
	verdict: async (event) => {
		const me = requireRight(event, 'fits');
		const danceId = idParam(event.params.id);
		if (!danceId) error(404, 'No such dance.');
		const form = await event.request.formData();
		const rateText = String(form.get('rate') ?? '');
		const parsed = fitVerdictSchema.safeParse({
			trackId: Number(form.get('trackId')),
			danceId,
			verdict: form.get('verdict'),
			rate: rateText === '' ? undefined : Number(rateText)
		});
		if (!parsed.success) {
			return fail(400, { verdictError: parsed.error.issues[0]?.message ?? 'Not a verdict.' });
		}
		const result = setVerdict(parsed.data, me.id);
		if (!result.ok) return fail(result.status, { verdictError: result.error });
		return { judged: { trackId: result.fit.trackId, verdict: result.fit.verdict } };
	},
	request: async (event) => {
		const me = requireRight(event, 'dances');
		const danceId = idParam(event.params.id);
		if (!danceId) error(404, 'No such dance.');
		const form = await event.request.formData();
		const parsed = requestSchema.safeParse({
			message: form.get('message') ?? '',
			level: form.get('level') || undefined
		});
		if (!parsed.success) {
			return fail(400, { requestError: parsed.error.issues[0]?.message ?? 'Not a request.' });
		}
		const dance = getDance(danceId);
		if (!dance) error(404, 'No such dance.');
		// The target is worked out here, as the page showed it, not taken from the form.
		const { level, message } = parsed.data;
		const target = level ? lessonTarget(dance, level, lessonSettings()).targetBpm : null;
		const said = target
			? `For a ${LEVEL_LABELS[level!].toLowerCase()} lesson: about ${target} BPM.${message ? ` ${message}` : ''}`
			: message;
		try {
			requestSlowerMusic(danceId, said, me);
		} catch {
			// The dance was deleted meanwhile (the foreign key refuses the row).
			error(404, 'No such dance.');
		}
		return { requested: true };
	}
} satisfies Actions;
