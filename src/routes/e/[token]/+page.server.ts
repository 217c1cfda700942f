import { error, fail } from '@sveltejs/kit';
import { describeIssue } from '$lib/server/json-body';
import { publicRoute } from '$lib/server/guard';
import { publicEvening, requestableDances, storeRequest } from '$lib/server/share/public-evening';
import { qrDataUrl } from '$lib/server/share/qr';
import { requestKey, requestLimit } from '$lib/server/share/request-limit';
import { publicView } from './public-view';
import { requestSchema, type RequestValues } from './request-schema';
import type { Actions, PageServerLoad } from './$types';

function gone(): never {
	error(404, { message: 'This evening is not published (or the link is out of date).' });
}

export const load = (async (event) => {
	publicRoute(event);
	const evening = publicEvening(event.params.token);
	if (!evening) gone();
	event.setHeaders({ 'cache-control': 'no-store' });
	return {
		evening: publicView(evening),
		qr: await qrDataUrl(evening.shareUrl),
		dances: requestableDances()
	};
}) satisfies PageServerLoad;

const field = (form: FormData, name: string) => {
	const v = form.get(name);
	return typeof v === 'string' ? v : '';
};

export const actions = {
	request: async (event) => {
		publicRoute(event);
		const evening = publicEvening(event.params.token);
		if (!evening) gone();
		const form = await event.request.formData();
		const values: RequestValues = {
			danceId: field(form, 'danceId').slice(0, 20),
			danceName: field(form, 'danceName').slice(0, 200),
			message: field(form, 'message').slice(0, 1000),
			name: field(form, 'name').slice(0, 200)
		};
		const parsed = requestSchema.safeParse({ ...values, website: field(form, 'website') });
		if (!parsed.success) return fail(422, { values, message: describeIssue(parsed.error) });
		// A filled-in trap field means a bot: thank it and keep nothing.
		if (parsed.data.website) return { sent: true };
		if (!requestLimit.take(requestKey(evening.id, event.getClientAddress()))) {
			return fail(429, {
				values,
				message: 'Thank you, that is plenty of requests for now. Try again in ten minutes.'
			});
		}
		const stored = storeRequest(evening.id, parsed.data, event.locals.user?.id ?? null);
		if (!stored)
			return fail(422, { values, message: 'Choose a dance from the list or type its name.' });
		return { sent: true };
	}
} satisfies Actions;
