import { fail, redirect } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { createDance } from '$lib/server/dances/catalogue';
import { checkDanceForm, sheetFile } from '$lib/server/dances/form';
import { attachSheet, checkSheet, maxSheetBytes } from '$lib/server/dances/step-sheet';
import { emptyDanceValues } from '$lib/schemas/dance';
import type { Actions, PageServerLoad } from './$types';

export const load = ((event) => {
	requireRight(event, 'dances');
	return { initial: emptyDanceValues(), maxSheetMb: Math.round(maxSheetBytes() / 1024 / 1024) };
}) satisfies PageServerLoad;

export const actions = {
	save: async (event) => {
		const me = requireRight(event, 'dances');
		const form = await event.request.formData();
		const checked = checkDanceForm(form);
		if (!checked.ok) return fail(400, { values: checked.values, errors: checked.errors });
		const sheet = await sheetFile(form);
		const sheetCheck = sheet ? checkSheet(sheet.bytes) : null;
		if (sheetCheck && !sheetCheck.ok) {
			return fail(400, { values: checked.values, errors: { sheet: sheetCheck.error } });
		}
		const dance = createDance(checked.data, me.id);
		if (sheet) await attachSheet(dance.id, sheet);
		redirect(303, `/dances/${dance.id}`);
	}
} satisfies Actions;
