import { error, redirect } from '@sveltejs/kit';
import { config } from '$lib/server/config';
import { holds, requireRight } from '$lib/server/guard';
import { isTeam } from '$lib/server/share/access';
import { shareUrlOf } from '$lib/server/share/load-sheet';
import { editsEvenings, mayRead } from '$lib/server/evenings/access';
import { formChoices } from '$lib/server/evenings/form';
import { gapSeconds } from '$lib/server/evenings/gap';
import { loadEvening } from '$lib/server/evenings/load';
import { eveningIdOf } from '$lib/server/evenings/respond';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	const user = requireRight(event, 'readEvenings');
	const evening = loadEvening(eveningIdOf(event.params));
	if (!evening || !mayRead(user, evening)) error(404, { message: 'There is no such evening.' });
	// A dancer sees the night as dancers do, with the request form, not the team's desk.
	if (!isTeam(user) && evening.shareToken) redirect(303, `/e/${evening.shareToken}`);
	const canEdit = editsEvenings(user);
	return {
		evening,
		canEdit,
		canKit: holds(user, 'playNight'),
		gapS: gapSeconds(evening.planSettings),
		shareUrl:
			evening.published && evening.shareToken
				? shareUrlOf(config().origin, evening.shareToken)
				: null,
		dances: canEdit ? formChoices().dances : []
	};
}) satisfies PageServerLoad;
