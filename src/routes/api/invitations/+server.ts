import { json } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { invite, InvitationError } from '$lib/server/invitations';
import { readJson } from '$lib/server/json-body';
import { inviteSchema } from '$lib/schemas/people';
import type { RequestHandler } from './$types';

export const POST = (async (event) => {
	const me = requireRight(event, 'people');
	const body = await readJson(event.request, inviteSchema);
	if (!body.ok) return body.response;
	try {
		await invite({ ...body.data, invitedBy: me.id });
	} catch (e) {
		if (e instanceof InvitationError) return json({ error: e.message }, { status: 409 });
		throw e;
	}
	return json({ invited: body.data.email }, { status: 201 });
}) satisfies RequestHandler;
