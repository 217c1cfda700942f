// Zod schemas for the tracks API, shared by the routes (which validate) and the music page
// (which builds the same shapes). One schema per body or query.
import { z } from 'zod';
import { lineText } from '../schemas/text';
import { TEMPO_SOURCES, VERDICTS } from '../domain';

// Messages in words a DJ reads, not the validator's own wording.
const bpm = z
	.number({ message: 'A tempo is a number of beats per minute.' })
	.gt(0, 'A tempo is above 0 BPM.')
	.lt(400, 'A tempo is below 400 BPM.');
const meter = z.union([z.literal(3), z.literal(4)], {
	message: 'The meter is 3 (3/4) or 4 (4/4).'
});

/** The browser's analysis, sent beside the file on upload. */
export const analysisSchema = z.object({
	bpm: bpm.nullable(),
	rawBpm: bpm.nullable().optional(),
	offsetS: z.number().min(0).max(3600).default(0),
	confidence: z.number().min(0).max(1).nullable().optional(),
	/** The other reading when the two levels were nearly as strong ("check by ear"). */
	alternative: bpm.nullable().optional(),
	source: z.enum(TEMPO_SOURCES).default('detected'),
	meter: meter.default(4),
	candidates: z
		.array(z.object({ bpm, score: z.number().finite() }))
		.max(16)
		.default([]),
	/** The browser may read the tags too; the server's own reading wins when it has one. */
	title: z.string().max(300).optional(),
	artist: z.string().max(300).optional(),
	album: z.string().max(300).optional()
});
export type Analysis = z.infer<typeof analysisSchema>;

export const patchSchema = z
	.object({
		version: z.number().int().positive(),
		title: lineText(300, 'title').min(1, 'A title cannot be empty.').optional(),
		artist: lineText(300, 'artist').optional(),
		album: lineText(300, 'album').optional(),
		bpm: bpm.nullable().optional(),
		/** null: the DJ has chosen between the two readings. */
		altBpm: bpm.nullable().optional(),
		bpmSource: z.enum(TEMPO_SOURCES).optional(),
		offsetS: z.number().min(0).max(3600).optional(),
		meter: meter.optional(),
		phraseBeats: z.number().int().min(1).max(256).optional(),
		introBeats: z.number().int().min(0).max(1024).optional()
	})
	.strict();
export type TrackPatch = z.infer<typeof patchSchema>;

export const SORTS = [
	'bpm',
	'-bpm',
	'title',
	'-title',
	'artist',
	'-artist',
	'album',
	'-album',
	'durationS',
	'-durationS',
	'createdAt',
	'-createdAt',
	'confidence',
	'-confidence'
] as const;
export type TrackSort = (typeof SORTS)[number];

export const MAX_LIMIT = 500;

const optionalNumber = z.preprocess(
	(v) => (v === '' || v === null ? undefined : v),
	z.coerce.number({ message: 'Give a tempo filter as a number of BPM.' }).finite().optional()
);

/** `unjudged` means: no verdict yet (for the dance given, or for any dance). */
export const VERDICT_FILTERS = [...VERDICTS, 'unjudged'] as const;

export const listQuerySchema = z.object({
	q: z.string().trim().max(200, 'Keep the search under 200 characters.').optional(),
	bpmMin: optionalNumber,
	bpmMax: optionalNumber,
	meter: z.preprocess(
		(v) => (v === '' ? undefined : v),
		z.coerce.number({ message: 'The meter is 3 or 4.' }).pipe(meter).optional()
	),
	dance: z.preprocess(
		(v) => (v === '' ? undefined : v),
		z.coerce
			.number({ message: 'The dance filter is a dance id.' })
			.int('The dance filter is a dance id.')
			.positive('The dance filter is a dance id.')
			.optional()
	),
	verdict: z
		.enum(VERDICT_FILTERS, { message: `Verdict is one of: ${VERDICT_FILTERS.join(', ')}.` })
		.optional(),
	/** "1": only tracks whose tempo awaits a check by ear. */
	checkByEar: z.enum(['1'], { message: 'checkByEar is 1 or left out.' }).optional(),
	sort: z.enum(SORTS, { message: `Sort by one of: ${SORTS.join(', ')}.` }).default('title'),
	limit: z.coerce
		.number({ message: 'The limit is a number of tracks.' })
		.int('The limit is a whole number.')
		.min(1, 'The limit is at least 1.')
		.max(MAX_LIMIT, `The limit is at most ${MAX_LIMIT}.`)
		.default(100),
	cursor: z.string().max(1000, 'That cursor is not one this server gave.').optional()
});
export type TrackListQuery = z.infer<typeof listQuerySchema>;
