import { fail } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import {
	cancelInvitation,
	invite,
	InvitationError,
	pendingInvitations,
	resendInvitation
} from '$lib/server/invitations';
import { listPeople, setRoles, withdrawAccess } from '$lib/server/users';
import { invitationIdSchema, inviteSchema, rolesSchema, withdrawSchema } from '$lib/schemas/people';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	requireRight(event, 'people');
	return { people: listPeople(), pending: pendingInvitations() };
}) satisfies PageServerLoad;

export const actions = {
	invite: async (event) => {
		const me = requireRight(event, 'people');
		const form = await event.request.formData();
		const values = {
			email: String(form.get('email') ?? ''),
			name: String(form.get('name') ?? ''),
			roles: form.getAll('roles').map(String)
		};
		const parsed = inviteSchema.safeParse(values);
		if (!parsed.success) {
			return fail(400, { invite: { values, message: parsed.error.issues[0]?.message } });
		}
		try {
			await invite({ ...parsed.data, invitedBy: me.id });
		} catch (e) {
			if (e instanceof InvitationError)
				return fail(400, { invite: { values, message: e.message } });
			throw e;
		}
		return { invited: parsed.data.email };
	},
	roles: async (event) => {
		const me = requireRight(event, 'people');
		const form = await event.request.formData();
		const parsed = rolesSchema.safeParse({
			userId: form.get('userId'),
			roles: form.getAll('roles').map(String)
		});
		if (!parsed.success) return fail(400, { rolesMessage: parsed.error.issues[0]?.message });
		if (parsed.data.userId === me.id && !parsed.data.roles.includes('admin')) {
			return fail(400, { rolesMessage: 'You cannot remove your own admin role.' });
		}
		if (!setRoles(parsed.data.userId, parsed.data.roles)) {
			return fail(404, { rolesMessage: 'There is no such person.' });
		}
		return { saved: parsed.data.userId };
	},
	withdraw: async (event) => {
		const me = requireRight(event, 'people');
		const form = await event.request.formData();
		const parsed = withdrawSchema.safeParse({ userId: form.get('userId') });
		if (!parsed.success) return fail(400, { rolesMessage: parsed.error.issues[0]?.message });
		// So that the team always keeps an admin: the one acting.
		if (parsed.data.userId === me.id) {
			return fail(400, { rolesMessage: 'You cannot withdraw your own access.' });
		}
		if (!withdrawAccess(parsed.data.userId)) {
			return fail(404, { rolesMessage: 'There is no such person.' });
		}
		return { withdrawn: parsed.data.userId };
	},
	resend: async (event) => {
		requireRight(event, 'people');
		const parsed = invitationIdSchema.safeParse({ id: (await event.request.formData()).get('id') });
		if (!parsed.success) return fail(400, { invitationMessage: parsed.error.issues[0]?.message });
		const pending = pendingInvitations().find((i) => i.id === parsed.data.id);
		if (!pending || !(await resendInvitation(parsed.data.id)))
			return fail(404, { invitationMessage: 'That invitation has been used or cancelled.' });
		return { resent: pending.email };
	},
	cancel: async (event) => {
		requireRight(event, 'people');
		const parsed = invitationIdSchema.safeParse({ id: (await event.request.formData()).get('id') });
		if (!parsed.success) return fail(400, { invitationMessage: parsed.error.issues[0]?.message });
		if (!cancelInvitation(parsed.data.id))
			return fail(404, { invitationMessage: 'That invitation has been used or cancelled.' });
		return { cancelled: parsed.data.id };
	}
} satisfies Actions;
