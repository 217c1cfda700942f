// One dance's fields, shared by the catalogue forms, the dances API and the CSV import.
// Tags and restarts are sent as two lists; the database keeps them together as `events`.
import { z } from 'zod';
import { blockText, lineText } from './text';
import { FORMATIONS, LEVELS, RHYTHMS, VERDICTS } from '../domain';

const wholeNumber = (what: string, min: number, max: number) =>
	z
		.number({ message: `Enter the ${what} as a number.` })
		.int(`The ${what} is a whole number.`)
		.min(min, `The ${what} is at least ${min}.`)
		.max(max, `The ${what} is at most ${max}.`);

const bpm = (what: string) =>
	z
		.number({ message: `Enter the ${what} in BPM.` })
		.gt(0, `The ${what} is above 0 BPM.`)
		.lt(400, `The ${what} is below 400 BPM.`);

export const tagSchema = z.object({
	repetition: wholeNumber('repetition', 1, 999),
	afterCount: wholeNumber('count', 1, 1024),
	lengthCounts: wholeNumber('tag length', 1, 256)
});

export const restartSchema = z.object({
	repetition: wholeNumber('repetition', 1, 999),
	afterCount: wholeNumber('count', 1, 1024)
});

export const danceFields = z.object({
	name: lineText(120, 'name').min(1, 'Enter a name.'),
	counts: wholeNumber('counts', 1, 1024),
	walls: z.union([z.literal(1), z.literal(2), z.literal(4)], {
		message: 'A dance has 1, 2 or 4 walls.'
	}),
	level: z.enum(LEVELS, { message: 'Choose a level.' }),
	rhythm: z.enum(RHYTHMS, { message: 'Choose a rhythm.' }).default('other'),
	meter: z.union([z.literal(3), z.literal(4)], { message: 'The meter is 3 or 4.' }).default(4),
	bpmMin: bpm('slowest tempo'),
	bpmMax: bpm('fastest tempo'),
	turn: z
		.enum(['left', 'right'], { message: 'Turn is left, right or none.' })
		.nullable()
		.default(null),
	formation: z
		.enum(FORMATIONS, { message: 'Formation is line, partner or circle.' })
		.default('line'),
	tags: z
		.array(tagSchema, { message: 'Send tags as a list.' })
		.max(50, 'At most 50 tags.')
		.default([]),
	restarts: z
		.array(restartSchema, { message: 'Send restarts as a list.' })
		.max(50, 'At most 50 restarts.')
		.default([]),
	notes: blockText(4000, 'notes').default(''),
	choreographer: lineText(120, 'choreographer').default(''),
	wellKnown: z.boolean({ message: 'wellKnown is true or false.' }).default(false)
});

type Fields = z.infer<typeof danceFields>;

/** Checks across fields: the range's order and where tags and restarts fall. */
function crossCheck(d: Pick<Fields, 'bpmMin' | 'bpmMax' | 'counts' | 'tags' | 'restarts'>) {
	const issues: { path: (string | number)[]; message: string }[] = [];
	if (!(d.bpmMin < d.bpmMax)) {
		issues.push({ path: ['bpmMax'], message: 'The fastest tempo must be above the slowest.' });
	}
	d.tags.forEach((t, i) => {
		if (t.afterCount > d.counts)
			issues.push({
				path: ['tags', i, 'afterCount'],
				message: `A tag falls within ${d.counts} counts.`
			});
	});
	d.restarts.forEach((r, i) => {
		if (r.afterCount >= d.counts)
			issues.push({
				path: ['restarts', i, 'afterCount'],
				message: `A restart falls before count ${d.counts}.`
			});
	});
	return issues;
}

export const danceSchema = danceFields.superRefine((d, ctx) => {
	for (const issue of crossCheck(d)) ctx.addIssue({ code: 'custom', ...issue });
});

export type DanceInput = z.infer<typeof danceSchema>;

/** PATCH: any subset of the fields, with the version the client last saw. */
export const dancePatchSchema = danceFields.partial().extend({
	version: z
		.number({ message: 'Send the version you last saw.' })
		.int('The version is a whole number.')
		.positive('The version is above 0.')
});
export type DancePatch = z.infer<typeof dancePatchSchema>;

export const danceFilterSchema = z.object({
	q: z.string().trim().max(120).optional(),
	level: z.enum(LEVELS).optional(),
	rhythm: z.enum(RHYTHMS).optional(),
	meter: z.coerce
		.number()
		.pipe(z.union([z.literal(3), z.literal(4)]))
		.optional(),
	formation: z.enum(FORMATIONS).optional(),
	counts: z.coerce.number().int().positive().max(1024).optional(),
	walls: z.coerce
		.number()
		.pipe(z.union([z.literal(1), z.literal(2), z.literal(4)]))
		.optional(),
	/** A tempo in BPM the dance's range must hold. */
	tempo: z.coerce.number().positive().lt(400).optional()
});
export type DanceFilter = z.infer<typeof danceFilterSchema>;

const anId = (what: string) =>
	z
		.number({ message: `Send the ${what} id as a number.` })
		.int(`A ${what} id is a whole number.`)
		.positive(`A ${what} id is above 0.`);

export const fitVerdictSchema = z.object({
	trackId: anId('track'),
	danceId: anId('dance'),
	verdict: z.enum(VERDICTS, { message: 'The verdict is fits, fits-at-rate or does-not-fit.' }),
	// Past these the music sounds wrong (the fits table allows 0.25–4, far wider).
	rate: z
		.number({ message: 'Send the rate as a number, e.g. 0.95.' })
		.min(0.5, 'A rate is at least 0.5.')
		.max(2, 'A rate is at most 2.')
		.nullable()
		.optional(),
	notes: z
		.string({ message: 'Send the notes as text.' })
		.max(1000, 'Keep the notes under 1,000 characters.')
		.optional()
});
export type FitVerdictInput = z.infer<typeof fitVerdictSchema>;

/** One track–dance pair, as the verdict's DELETE names it. */
export const fitPairSchema = fitVerdictSchema.pick({ trackId: true, danceId: true });

/** Several tracks marked for one dance in one step (the music table's selection). */
export const fitVerdictBulkSchema = fitVerdictSchema.omit({ trackId: true }).extend({
	trackIds: z
		.array(anId('track'), { message: 'Send trackIds as a list of numbers.' })
		.min(1, 'Choose at least one track.')
		.max(500, 'Mark at most 500 tracks at a time.')
		.refine((ids) => new Set(ids).size === ids.length, 'A track is listed twice.')
});
export type FitVerdictBulkInput = z.infer<typeof fitVerdictBulkSchema>;

/** zod issues as { 'tags.0.afterCount': 'message' }, first message per field, for the forms. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
	const out: Record<string, string> = {};
	for (const issue of error.issues) {
		const key = issue.path.join('.') || 'form';
		out[key] ??= issue.message;
	}
	return out;
}

/** One tag or restart row of the dance form, as typed. */
export interface EventRow {
	kind: 'tag' | 'restart';
	repetition: string;
	afterCount: string;
	lengthCounts: string;
}

/** What the form shows: text as typed, so a bad number can be corrected in place. */
export interface DanceFormValues {
	name: string;
	counts: string;
	walls: string;
	level: string;
	rhythm: string;
	meter: string;
	bpmMin: string;
	bpmMax: string;
	turn: string;
	formation: string;
	notes: string;
	choreographer: string;
	wellKnown: boolean;
	events: EventRow[];
}

export const emptyDanceValues = (): DanceFormValues => ({
	name: '',
	counts: '32',
	walls: '4',
	level: 'beginner',
	rhythm: 'other',
	meter: '4',
	bpmMin: '',
	bpmMax: '',
	turn: '',
	formation: 'line',
	notes: '',
	choreographer: '',
	wellKnown: false,
	events: []
});
