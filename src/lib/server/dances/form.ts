// The dance form's fields (all strings in a FormData) to the shape danceSchema checks, and the
// values to send back when something is wrong, so the form keeps what the person typed.
import {
	danceSchema,
	fieldErrors,
	type DanceFormValues,
	type DanceInput
} from '../../schemas/dance';
import type { DanceJson } from './dance-json';

const text = (form: FormData, key: string) => {
	const v = form.get(key);
	return typeof v === 'string' ? v : '';
};

export function formValues(form: FormData): DanceFormValues {
	const kinds = form.getAll('eventKind').map(String);
	const reps = form.getAll('eventRepetition').map(String);
	const counts = form.getAll('eventAfterCount').map(String);
	const lengths = form.getAll('eventLength').map(String);
	return {
		name: text(form, 'name'),
		counts: text(form, 'counts'),
		walls: text(form, 'walls'),
		level: text(form, 'level'),
		rhythm: text(form, 'rhythm'),
		meter: text(form, 'meter'),
		bpmMin: text(form, 'bpmMin'),
		bpmMax: text(form, 'bpmMax'),
		turn: text(form, 'turn'),
		formation: text(form, 'formation'),
		notes: text(form, 'notes'),
		choreographer: text(form, 'choreographer'),
		wellKnown: form.get('wellKnown') === 'on',
		events: kinds.slice(0, 100).map((kind, i) => ({
			kind: kind === 'restart' ? 'restart' : 'tag',
			repetition: reps[i] ?? '',
			afterCount: counts[i] ?? '',
			lengthCounts: lengths[i] ?? ''
		}))
	};
}

/** '' is "not given" (so zod says it is missing), anything else a number or NaN. */
const num = (s: string) => (s.trim() === '' ? undefined : Number(s.trim().replace(',', '.')));

export type FormCheck =
	| { ok: true; data: DanceInput; values: DanceFormValues }
	| { ok: false; values: DanceFormValues; errors: Record<string, string> };

export function checkDanceForm(form: FormData): FormCheck {
	const values = formValues(form);
	const tagRows = values.events.filter((e) => e.kind === 'tag');
	const restartRows = values.events.filter((e) => e.kind === 'restart');
	const parsed = danceSchema.safeParse({
		name: values.name,
		counts: num(values.counts),
		walls: num(values.walls),
		level: values.level || undefined,
		rhythm: values.rhythm || undefined,
		meter: num(values.meter),
		bpmMin: num(values.bpmMin),
		bpmMax: num(values.bpmMax),
		turn: values.turn === '' ? null : values.turn,
		formation: values.formation || undefined,
		tags: tagRows.map((e) => ({
			repetition: num(e.repetition),
			afterCount: num(e.afterCount),
			lengthCounts: num(e.lengthCounts)
		})),
		restarts: restartRows.map((e) => ({
			repetition: num(e.repetition),
			afterCount: num(e.afterCount)
		})),
		notes: values.notes,
		choreographer: values.choreographer,
		wellKnown: values.wellKnown
	});
	if (parsed.success) return { ok: true, data: parsed.data, values };
	// Errors on tags.N / restarts.N point at rows of the one list the form shows.
	const errors: Record<string, string> = {};
	for (const [key, message] of Object.entries(fieldErrors(parsed.error))) {
		const m = /^(tags|restarts)\.(\d+)\.?(.*)$/.exec(key);
		if (!m) {
			errors[key] ??= message;
			continue;
		}
		const rows = m[1] === 'tags' ? tagRows : restartRows;
		const row = values.events.indexOf(rows[Number(m[2])]);
		errors[`events.${row}`] ??= message;
	}
	return { ok: false, values, errors };
}

export function valuesOf(d: DanceJson): DanceFormValues {
	return {
		name: d.name,
		counts: String(d.counts),
		walls: String(d.walls),
		level: d.level,
		rhythm: d.rhythm,
		meter: String(d.meter),
		bpmMin: String(d.bpmMin),
		bpmMax: String(d.bpmMax),
		turn: d.turn ?? '',
		formation: d.formation,
		notes: d.notes,
		choreographer: d.choreographer,
		wellKnown: d.wellKnown,
		events: [
			...d.tags.map((t) => ({
				kind: 'tag' as const,
				repetition: String(t.repetition),
				afterCount: String(t.afterCount),
				lengthCounts: String(t.lengthCounts)
			})),
			...d.restarts.map((r) => ({
				kind: 'restart' as const,
				repetition: String(r.repetition),
				afterCount: String(r.afterCount),
				lengthCounts: ''
			}))
		]
	};
}

/** The uploaded step sheet, if one was chosen. */
export async function sheetFile(
	form: FormData
): Promise<{ bytes: Uint8Array; name: string } | null> {
	const file = form.get('sheet');
	if (!(file instanceof File) || file.size === 0) return null;
	return { bytes: new Uint8Array(await file.arrayBuffer()), name: file.name };
}
