import { fail } from '@sveltejs/kit';
import { requireRight } from '$lib/server/guard';
import { checkDanceCsv, CSV_COLUMNS, importDanceCsv } from '$lib/server/dances/csv';
import type { Actions, PageServerLoad } from './$types';

/** A catalogue CSV is small; 2 MB is thousands of dances. */
const MAX_CSV_BYTES = 2 * 1024 * 1024;

async function csvText(form: FormData): Promise<string | { error: string }> {
	const file = form.get('file');
	if (file instanceof File && file.size > 0) {
		if (file.size > MAX_CSV_BYTES) return { error: 'The file is larger than 2 MB.' };
		return await file.text();
	}
	const text = String(form.get('csv') ?? '');
	if (text.length > MAX_CSV_BYTES) return { error: 'The text is longer than 2 MB.' };
	if (!text.trim()) return { error: 'Choose a CSV file or paste its text.' };
	return text;
}

export const load = ((event) => {
	requireRight(event, 'dances');
	return { columns: [...CSV_COLUMNS] };
}) satisfies PageServerLoad;

export const actions = {
	preview: async (event) => {
		requireRight(event, 'dances');
		const text = await csvText(await event.request.formData());
		if (typeof text !== 'string') return fail(400, { message: text.error });
		const check = checkDanceCsv(text);
		return { preview: { text, ...check } };
	},
	import: async (event) => {
		const me = requireRight(event, 'dances');
		const text = await csvText(await event.request.formData());
		if (typeof text !== 'string') return fail(400, { message: text.error });
		const result = importDanceCsv(text, me.id);
		if (!result.ok) {
			return fail(400, {
				message: 'Nothing was imported: fix the rows marked below first.',
				preview: { text, ...result.check }
			});
		}
		return { imported: result.imported };
	}
} satisfies Actions;
