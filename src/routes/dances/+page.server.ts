import { holds, requireRight } from '$lib/server/guard';
import { listDances } from '$lib/server/dances/catalogue';
import { danceFilterSchema } from '$lib/schemas/dance';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	const me = requireRight(event, 'readDances');
	const raw = Object.fromEntries(
		[...event.url.searchParams].filter(([k, v]) => v !== '' && k in danceFilterSchema.shape)
	);
	// A filter that does not parse is dropped rather than failing the page.
	const parsed = danceFilterSchema.safeParse(raw);
	const filter = parsed.success ? parsed.data : {};
	return {
		filter: {
			q: filter.q ?? '',
			level: filter.level ?? '',
			rhythm: filter.rhythm ?? '',
			meter: filter.meter ? String(filter.meter) : '',
			formation: filter.formation ?? '',
			counts: filter.counts ? String(filter.counts) : '',
			walls: filter.walls ? String(filter.walls) : '',
			tempo: filter.tempo ? String(filter.tempo) : ''
		},
		filterProblem: parsed.success ? null : 'One of the filters was not understood and is ignored.',
		dances: listDances(filter),
		canEdit: holds(me, 'dances')
	};
}) satisfies PageServerLoad;
