// Shared by the evening forms and the evenings API: an evening with its sections, the planner's
// settings, a run-order save and a planning request.
import { z } from 'zod';
import { blockText, lineText } from './text';
import { CROWD_MIXES, ENTRY_KINDS, SECTION_KINDS } from '../domain';

const id = z
	.number({ message: 'Give ids and versions as numbers.' })
	.int('Ids and versions are whole numbers.')
	.positive('Ids and versions are above 0.');
/** An ISO 8601 date-time with an offset or Z, as milliseconds since the epoch. */
export const isoInstant = z.iso
	.datetime({ offset: true, message: 'Give a date-time in ISO 8601, e.g. 2026-12-11T19:00:00Z.' })
	.transform((s) => Date.parse(s));

export const sectionInput = z.object({
	/** An existing section keeps its id (and the run order's links to it). */
	id: id.optional(),
	kind: z.enum(SECTION_KINDS, { message: 'Choose what kind of section this is.' }),
	title: lineText(100, 'section title').default(''),
	startsAt: isoInstant,
	endsAt: isoInstant,
	danceId: id.nullable().optional(),
	teacherId: id.nullable().optional()
});
export type SectionInput = z.infer<typeof sectionInput>;

const weights = z
	.record(z.string().max(40), z.number().min(0).max(100))
	.refine((w) => Object.keys(w).length <= 20, 'Too many weights.');

/** The planner knobs an evening may override (see src/lib/planner/settings.ts for defaults). */
export const plannerSettings = z
	.object({
		fitThreshold: z.number().min(0).max(1),
		repeatWindowMin: z.number().min(0).max(600),
		// 0: off, rests only where the sections put them (the default).
		breakEveryMin: z.union([z.literal(0), z.number().min(10).max(600)]),
		minRepetitions: z.number().min(0).max(20),
		minTrackS: z.number().min(0).max(1800),
		breakLengthMin: z.number().min(0).max(60),
		partnerEvery: z.number().int().min(0).max(12),
		partnerBackToBack: z.boolean(),
		maxConsecutiveFast: z.number().int().min(1).max(20),
		fastBpm: z.number().min(40).max(300),
		gapS: z.number().min(0).max(600),
		teachLengthMin: z.number().min(0).max(120),
		walkthroughLengthMin: z.number().min(0).max(60),
		endToleranceS: z.number().min(0).max(1800),
		lessonFallbackRate: z.number().min(0.5).max(1),
		iterations: z.number().int().min(0).max(200_000),
		timeBudgetMs: z.number().min(10).max(10_000),
		weights
	})
	.partial();

export const planSettingsInput = z.object({
	mustPlay: z
		.array(z.union([id, z.object({ danceId: id, trackId: id.optional() })]))
		.max(200)
		.optional(),
	neverPlay: z
		.object({
			danceIds: z.array(id).max(2000).optional(),
			trackIds: z.array(id).max(20000).optional()
		})
		.optional(),
	settings: plannerSettings.optional(),
	seed: z
		.number()
		.int()
		.min(0)
		.max(2 ** 31)
		.optional()
});
export type PlanSettingsInput = z.infer<typeof planSettingsInput>;

const eveningFields = {
	title: lineText(120, 'title').min(1, 'Give the evening a title.'),
	venue: lineText(200, 'venue').default(''),
	startsAt: isoInstant,
	endsAt: isoInstant,
	crowd: z.enum(CROWD_MIXES, { message: 'Choose the crowd’s level mix.' }).default('mixed'),
	notes: blockText(2000, 'notes').default(''),
	sections: z.array(sectionInput).max(40, 'Keep it to 40 sections.').default([]),
	planSettings: planSettingsInput.optional()
};

export const eveningCreate = z.object(eveningFields);
export type EveningCreate = z.infer<typeof eveningCreate>;

/** PATCH: any field; `sections`, when given, is the whole new list (ids keep existing ones). */
export const eveningPatch = z
	.object({
		title: eveningFields.title.optional(),
		venue: lineText(200, 'venue').optional(),
		startsAt: isoInstant.optional(),
		endsAt: isoInstant.optional(),
		crowd: z.enum(CROWD_MIXES, { message: 'Choose the crowd’s level mix.' }).optional(),
		notes: blockText(2000, 'notes').optional(),
		sections: z.array(sectionInput).max(40, 'Keep it to 40 sections.').optional(),
		planSettings: planSettingsInput.optional(),
		/** The evening's version, when the client wants a stale edit refused. */
		version: id.optional()
	})
	.strict();
export type EveningPatch = z.infer<typeof eveningPatch>;

export const entryInput = z
	.object({
		kind: z.enum(ENTRY_KINDS, { message: 'Unknown kind of entry.' }),
		sectionId: id.nullable().optional(),
		danceId: id.nullable().optional(),
		trackId: id.nullable().optional(),
		// The database allows 0.25 < rate < 4; a DJ never goes near those ends.
		rate: z
			.number()
			.min(0.5, 'Keep the rate at 0.5 or above.')
			.max(2, 'Keep the rate at 2 or below.')
			.default(1),
		durationS: z
			.number()
			.min(0)
			.max(6 * 3600)
			.default(0),
		/** For a locked entry: the start (seconds from the evening's start) it is pinned to. */
		startS: z
			.number()
			.min(0)
			.max(24 * 3600)
			.optional(),
		locked: z.boolean().default(false),
		text: lineText(500, 'text').default(''),
		reasons: z.array(z.string().max(300)).max(30).default([])
	})
	.extend({
		/** The planner's name for `text` (a teach's or break's title): a plan saves as it came. */
		title: lineText(500, 'title').optional()
	})
	.superRefine((e, ctx) => {
		if (e.kind === 'dance' && (!e.danceId || !e.trackId)) {
			ctx.addIssue({ code: 'custom', message: 'A dance entry needs a dance and a track.' });
		}
	})
	.transform(({ title, ...e }) => ({ ...e, text: e.text || title || '' }));
export type EntryInput = z.infer<typeof entryInput>;

export const runOrderSave = z.object({
	version: id,
	entries: z.array(entryInput).max(500, 'Keep the run order to 500 entries.')
});
export type RunOrderSave = z.infer<typeof runOrderSave>;

/** POST /plan: a seed, and optionally the editor's unsaved run order (its locks are kept). */
export const planRequest = z.object({
	seed: z
		.number()
		.int()
		.min(0)
		.max(2 ** 31)
		.optional(),
	entries: z.array(entryInput).max(500).optional()
});

/** The evening form: wall-clock date and times in the club's zone. */
const hm = z.string().regex(/^\d{2}:\d{2}$/, 'Give a time as HH:MM.');
export const eveningForm = z.object({
	title: eveningFields.title,
	venue: lineText(200, 'venue'),
	date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Give a date.'),
	start: hm,
	end: hm,
	crowd: z.enum(CROWD_MIXES, { message: 'Choose the crowd’s level mix.' }),
	notes: blockText(2000, 'notes'),
	sections: z
		.array(
			z.object({
				id: z.coerce.number().int().positive().optional(),
				kind: z.enum(SECTION_KINDS, { message: 'Choose what kind of section this is.' }),
				title: lineText(100, 'section title'),
				start: hm,
				end: hm,
				danceId: z.coerce.number().int().positive().optional(),
				teacherId: z.coerce.number().int().positive().optional()
			})
		)
		.max(40),
	mustPlay: z.array(z.coerce.number().int().positive()).max(200),
	neverPlay: z.array(z.coerce.number().int().positive()).max(2000),
	// Empty is off; otherwise whole minutes, as the planner's breakEveryMin accepts.
	restEveryMin: z.union([
		z.literal(''),
		z.coerce
			.number({ message: 'Give the minutes of dancing between rests as a number.' })
			.int('Give whole minutes of dancing between rests.')
			.min(10, 'A rest after every 10 minutes of dancing at the least.')
			.max(600, 'A rest after every 600 minutes of dancing at the most.')
	]),
	partnerEvery: z.coerce
		.number({ message: 'Choose how often a partner dance comes.' })
		.int('Choose how often a partner dance comes.')
		.min(0, 'Choose how often a partner dance comes.')
		.max(12, 'A partner dance after every 12 line dances at the most.'),
	partnerBackToBack: z.boolean()
});
export type EveningFormInput = z.infer<typeof eveningForm>;
