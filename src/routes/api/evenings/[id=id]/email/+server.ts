import { json } from '@sveltejs/kit';
import { config } from '$lib/server/config';
import { requireRight } from '$lib/server/guard';
import { badRequest, readJson } from '$lib/server/json-body';
import { eveningId, notFound } from '$lib/server/share/access';
import { chooseRecipients, sendRunOrder, teamMembers } from '$lib/server/share/email';
import { loadSheet } from '$lib/server/share/load-sheet';
import { emailSchema } from './schema';
import type { RequestHandler } from './$types';

/** The people the organiser may choose from: names and roles, no addresses. */
export const GET = ((event) => {
	requireRight(event, 'evenings');
	if (!loadSheet(eveningId(event.params.id), config().origin)) notFound();
	const items = teamMembers().map(({ id, name, roles }) => ({ id, name, roles }));
	return json({ items });
}) satisfies RequestHandler;

export const POST = (async (event) => {
	const user = requireRight(event, 'evenings');
	const sheet = loadSheet(eveningId(event.params.id), config().origin);
	if (!sheet) notFound();
	const body = await readJson(event.request, emailSchema);
	if (!body.ok) return body.response;
	const recipients = chooseRecipients(body.data);
	if (recipients.length === 0) {
		return badRequest('Choose at least one person or role with an account in use.', 422);
	}
	const sent = await sendRunOrder(sheet, recipients, {
		message: body.data.message ?? '',
		origin: config().origin,
		senderName: user.name
	});
	return json({ sent });
}) satisfies RequestHandler;
