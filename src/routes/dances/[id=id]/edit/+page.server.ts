import { error, fail, redirect } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { deleteDance, getDance, updateDance } from '$lib/server/dances/catalogue';
import { checkDanceForm, sheetFile, valuesOf } from '$lib/server/dances/form';
import { idParam } from '$lib/route-id';
import {
	attachSheet,
	checkSheet,
	detachSheet,
	forgetSheet,
	maxSheetBytes
} from '$lib/server/dances/step-sheet';
import type { Actions, PageServerLoad } from './$types';

function danceOr404(idText: string) {
	const id = idParam(idText);
	const dance = id ? getDance(id) : null;
	if (!dance) error(404, 'No such dance.');
	return dance;
}

export const load = ((event) => {
	requireRight(event, 'dances');
	const dance = danceOr404(event.params.id);
	return {
		dance,
		initial: valuesOf(dance),
		maxSheetMb: Math.round(maxSheetBytes() / 1024 / 1024)
	};
}) satisfies PageServerLoad;

export const actions = {
	save: async (event) => {
		requireRight(event, 'dances');
		const dance = danceOr404(event.params.id);
		const form = await event.request.formData();
		const version = Number(form.get('version'));
		const checked = checkDanceForm(form);
		if (!checked.ok) return fail(400, { values: checked.values, errors: checked.errors });
		const sheet = await sheetFile(form);
		const sheetCheck = sheet ? checkSheet(sheet.bytes) : null;
		if (sheetCheck && !sheetCheck.ok) {
			return fail(400, { values: checked.values, errors: { sheet: sheetCheck.error } });
		}
		const result = updateDance(dance.id, { ...checked.data, version });
		if (!result.ok) {
			return fail(result.status === 409 ? 409 : 400, {
				values: checked.values,
				errors: {},
				message: result.error,
				stale: result.status === 409
			});
		}
		if (sheet) await attachSheet(dance.id, sheet);
		else if (form.get('removeSheet') === 'on') await detachSheet(dance.id);
		redirect(303, `/dances/${dance.id}`);
	},
	delete: async (event) => {
		requireRight(event, 'dances');
		const dance = danceOr404(event.params.id);
		const result = deleteDance(dance.id);
		await forgetSheet(result.sheetKey);
		redirect(303, '/dances');
	}
} satisfies Actions;
