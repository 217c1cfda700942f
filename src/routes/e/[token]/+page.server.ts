import { randomUUID } from 'node:crypto';
import { error, fail, type RequestEvent } from '@sveltejs/kit';
import { describeIssue } from '$lib/server/json-body';
import { publicRoute } from '$lib/server/guard';
import {
	publicAnswers,
	publicEvening,
	requestableDances,
	storeRequest
} from '$lib/server/share/public-evening';
import { qrDataUrl } from '$lib/server/share/qr';
import { DEVICE_COOKIE, takeRequest } from '$lib/server/share/request-limit';
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
		dances: requestableDances(),
		answers: publicAnswers(evening.id)
	};
}) satisfies PageServerLoad;

/** This browser's random device id, given on its first request (only the action sets it, so
 * the page itself stays free of cookies). */
function deviceOf(event: RequestEvent): string {
	const known = event.cookies.get(DEVICE_COOKIE);
	if (known && /^[0-9a-f-]{36}$/.test(known)) return known;
	const made = randomUUID();
	event.cookies.set(DEVICE_COOKIE, made, {
		path: '/e',
		httpOnly: true,
		sameSite: 'lax',
		maxAge: 60 * 60 * 24 * 365
	});
	return made;
}

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
		const from = { device: deviceOf(event), address: event.getClientAddress() };
		if (!takeRequest(evening.id, from)) {
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
