// Floorset's tables: the whole domain of DESIGN.md. Later work adds columns, not rewrites.
// Times are integer milliseconds since the epoch (Drizzle's timestamp_ms mode gives Dates).
import { sql } from 'drizzle-orm';
import {
	check,
	index,
	integer,
	primaryKey,
	real,
	sqliteTable,
	text,
	uniqueIndex
} from 'drizzle-orm/sqlite-core';
import type { PlanSettingsInput } from '../../schemas/evening';
import {
	CROWD_MIXES,
	ENTRY_KINDS,
	FORMATIONS,
	LEVELS,
	ROLES,
	SECTION_KINDS,
	TEMPO_SOURCES,
	VERDICTS,
	type PhraseEvent
} from '../../domain';

/** A CHECK list from one of domain.ts's lists (our own constants, never input). */
const oneOf = (values: readonly string[]) => sql.raw(values.map((v) => `'${v}'`).join(','));

const createdAt = () =>
	integer('created_at', { mode: 'timestamp_ms' })
		.notNull()
		.default(sql`(unixepoch('subsec') * 1000)`);
const updatedAt = () =>
	integer('updated_at', { mode: 'timestamp_ms' })
		.notNull()
		.default(sql`(unixepoch('subsec') * 1000)`);

export const users = sqliteTable(
	'users',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		email: text('email').notNull(),
		name: text('name').notNull(),
		/** Null until the person accepts an invitation and sets a password. */
		passwordHash: text('password_hash'),
		createdAt: createdAt(),
		updatedAt: updatedAt()
	},
	(t) => [
		uniqueIndex('users_email_unique').on(sql`lower(${t.email})`),
		check('users_email_shape', sql`${t.email} LIKE '%_@_%'`)
	]
);

export const userRoles = sqliteTable(
	'user_roles',
	{
		userId: integer('user_id')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		role: text('role', {
			enum: ROLES
		}).notNull()
	},
	(t) => [
		primaryKey({ columns: [t.userId, t.role] }),
		check('user_roles_role', sql`${t.role} IN (${oneOf(ROLES)})`)
	]
);

export const invitations = sqliteTable(
	'invitations',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		email: text('email').notNull(),
		name: text('name').notNull(),
		/** JSON array of roles the invitee will hold. */
		roles: text('roles', { mode: 'json' }).$type<string[]>().notNull(),
		/** SHA-256 of the one-time token; the token itself is only ever in the e-mail. */
		tokenHash: text('token_hash').notNull().unique(),
		invitedBy: integer('invited_by').references(() => users.id, { onDelete: 'set null' }),
		expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
		acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
		createdAt: createdAt()
	},
	(t) => [index('invitations_email').on(t.email)]
);

/** One-time links to set a new password, asked for on the sign-in page ("Forgot your password?"). */
export const passwordResets = sqliteTable(
	'password_resets',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		userId: integer('user_id')
			.notNull()
			.references(() => users.id, { onDelete: 'cascade' }),
		/** SHA-256 of the one-time token; the token itself is only ever in the e-mail. */
		tokenHash: text('token_hash').notNull().unique(),
		expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
		usedAt: integer('used_at', { mode: 'timestamp_ms' }),
		createdAt: createdAt()
	},
	(t) => [index('password_resets_user').on(t.userId, t.createdAt)]
);

/** Failed sign-ins, for rate limiting per account and per address. */
export const signInFailures = sqliteTable(
	'sign_in_failures',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		/** 'email:<address>' or 'ip:<address>'. */
		key: text('key').notNull(),
		at: integer('at').notNull()
	},
	(t) => [index('sign_in_failures_key_at').on(t.key, t.at)]
);

/** Mail captured by the built-in SMTP catcher in development, demo and tests. */
export const outbox = sqliteTable('outbox', {
	id: integer('id').primaryKey({ autoIncrement: true }),
	from: text('from').notNull(),
	to: text('to').notNull(),
	subject: text('subject').notNull(),
	text: text('text').notNull(),
	html: text('html'),
	attachments: text('attachments', { mode: 'json' })
		.$type<{ filename: string; contentType: string; size: number }[]>()
		.notNull()
		.default([]),
	raw: text('raw').notNull(),
	createdAt: createdAt()
});

export const tracks = sqliteTable(
	'tracks',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		title: text('title').notNull(),
		artist: text('artist').notNull().default(''),
		album: text('album').notNull().default(''),
		durationS: real('duration_s').notNull(),
		/** The tempo we trust (after half/double resolution or the DJ's correction). */
		bpm: real('bpm'),
		/** What the detector said before resolution. */
		rawBpm: real('raw_bpm'),
		bpmSource: text('bpm_source', { enum: TEMPO_SOURCES }).notNull().default('detected'),
		offsetS: real('offset_s').notNull().default(0),
		confidence: real('confidence'),
		/** The other metrical level's tempo when the measurement could not tell the two apart
		 * ("check by ear"); null when it could, or once the DJ has chosen. */
		altBpm: real('alt_bpm'),
		/** Other tempo readings the DJ may flip to (JSON [{bpm, score}]). */
		candidates: text('candidates', { mode: 'json' })
			.$type<{ bpm: number; score: number }[]>()
			.notNull()
			.default([]),
		meter: integer('meter').notNull().default(4),
		phraseBeats: integer('phrase_beats').notNull().default(32),
		introBeats: integer('intro_beats').notNull().default(0),
		tagBpm: real('tag_bpm'),
		format: text('format').notNull().default(''),
		mimeType: text('mime_type').notNull(),
		fileSize: integer('file_size').notNull(),
		sha256: text('sha256').notNull().unique(),
		/** Key of the audio in storage; never built from user input. */
		storageKey: text('storage_key').notNull(),
		originalName: text('original_name').notNull().default(''),
		/** When the start-up sweep found the audio file gone (ms since epoch); null while it is
		 * there. Such a track keeps its verdicts and run-order places but is not planned or
		 * exported until the same file is uploaded again. */
		audioMissingAt: integer('audio_missing_at'),
		uploadedBy: integer('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: updatedAt(),
		version: integer('version').notNull().default(1)
	},
	(t) => [
		check('tracks_meter', sql`${t.meter} IN (3, 4)`),
		check('tracks_bpm', sql`${t.bpm} IS NULL OR (${t.bpm} > 0 AND ${t.bpm} < 400)`),
		check('tracks_duration', sql`${t.durationS} >= 0`),
		check('tracks_phrase', sql`${t.phraseBeats} > 0`),
		check('tracks_intro', sql`${t.introBeats} >= 0`),
		check('tracks_size', sql`${t.fileSize} >= 0`),
		check('tracks_source', sql`${t.bpmSource} IN (${oneOf(TEMPO_SOURCES)})`),
		index('tracks_bpm_idx').on(t.bpm),
		index('tracks_title_idx').on(t.title),
		index('tracks_created_idx').on(t.createdAt),
		// The music table's sorted pages (src/lib/server/tracks/list-tracks.ts sorts by these
		// expressions, then id, for keyset paging).
		index('tracks_title_nocase_id_idx').on(sql`${t.title} COLLATE NOCASE`, t.id),
		index('tracks_artist_nocase_id_idx').on(sql`${t.artist} COLLATE NOCASE`, t.id)
	]
);

export const dances = sqliteTable(
	'dances',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		name: text('name').notNull(),
		counts: integer('counts').notNull(),
		walls: integer('walls').notNull(),
		level: text('level', {
			enum: LEVELS
		}).notNull(),
		rhythm: text('rhythm').notNull().default('other'),
		meter: integer('meter').notNull().default(4),
		bpmMin: real('bpm_min').notNull(),
		bpmMax: real('bpm_max').notNull(),
		turn: text('turn', { enum: ['left', 'right'] }),
		formation: text('formation', { enum: FORMATIONS }).notNull().default('line'),
		/** Tags and restarts: JSON PhraseEvent[] (see src/lib/domain.ts). */
		events: text('events', { mode: 'json' }).$type<PhraseEvent[]>().notNull().default([]),
		notes: text('notes').notNull().default(''),
		choreographer: text('choreographer').notNull().default(''),
		/** A dance most of the floor knows: a good last dance. */
		wellKnown: integer('well_known', { mode: 'boolean' }).notNull().default(false),
		stepSheetKey: text('step_sheet_key'),
		stepSheetName: text('step_sheet_name'),
		createdBy: integer('created_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: updatedAt(),
		version: integer('version').notNull().default(1)
	},
	(t) => [
		check('dances_counts', sql`${t.counts} > 0`),
		check('dances_walls', sql`${t.walls} IN (1, 2, 4)`),
		check('dances_meter', sql`${t.meter} IN (3, 4)`),
		check('dances_tempo', sql`${t.bpmMin} > 0 AND ${t.bpmMin} < ${t.bpmMax}`),
		check('dances_level', sql`${t.level} IN (${oneOf(LEVELS)})`),
		check('dances_turn', sql`${t.turn} IS NULL OR ${t.turn} IN ('left','right')`),
		check('dances_formation', sql`${t.formation} IN (${oneOf(FORMATIONS)})`),
		index('dances_name_idx').on(t.name)
	]
);

export const fits = sqliteTable(
	'fits',
	{
		trackId: integer('track_id')
			.notNull()
			.references(() => tracks.id, { onDelete: 'cascade' }),
		danceId: integer('dance_id')
			.notNull()
			.references(() => dances.id, { onDelete: 'cascade' }),
		verdict: text('verdict', { enum: VERDICTS }).notNull(),
		/** Playback rate the team chose (1 = as recorded). */
		rate: real('rate').notNull().default(1),
		/** Rate that suits a lesson of this dance to this track, if the team set one. */
		lessonRate: real('lesson_rate'),
		notes: text('notes').notNull().default(''),
		decidedBy: integer('decided_by').references(() => users.id, { onDelete: 'set null' }),
		updatedAt: updatedAt()
	},
	(t) => [
		primaryKey({ columns: [t.trackId, t.danceId] }),
		check('fits_verdict', sql`${t.verdict} IN (${oneOf(VERDICTS)})`),
		check('fits_rate', sql`${t.rate} > 0.25 AND ${t.rate} < 4`),
		index('fits_dance_idx').on(t.danceId)
	]
);

export const evenings = sqliteTable(
	'evenings',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		title: text('title').notNull(),
		venue: text('venue').notNull().default(''),
		startsAt: integer('starts_at', { mode: 'timestamp_ms' }).notNull(),
		endsAt: integer('ends_at', { mode: 'timestamp_ms' }).notNull(),
		crowd: text('crowd', { enum: CROWD_MIXES }).notNull().default('mixed'),
		notes: text('notes').notNull().default(''),
		status: text('status', { enum: ['draft', 'published'] })
			.notNull()
			.default('draft'),
		/** Random token of the public page; null when not published. */
		shareToken: text('share_token').unique(),
		/** Planner settings and must-play / never-play lists (JSON), read through planSettingsInput. */
		planSettings: text('plan_settings', { mode: 'json' })
			.$type<PlanSettingsInput>()
			.notNull()
			.default({}),
		/** Bumped by every run-order save, so a stale save is refused (409). */
		runOrderVersion: integer('run_order_version').notNull().default(1),
		createdBy: integer('created_by').references(() => users.id, { onDelete: 'set null' }),
		createdAt: createdAt(),
		updatedAt: updatedAt(),
		version: integer('version').notNull().default(1)
	},
	(t) => [
		check('evenings_times', sql`${t.endsAt} > ${t.startsAt}`),
		check('evenings_status', sql`${t.status} IN ('draft','published')`),
		check('evenings_crowd', sql`${t.crowd} IN (${oneOf(CROWD_MIXES)})`),
		index('evenings_starts_idx').on(t.startsAt)
	]
);

export const sections = sqliteTable(
	'sections',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		eveningId: integer('evening_id')
			.notNull()
			.references(() => evenings.id, { onDelete: 'cascade' }),
		position: integer('position').notNull(),
		kind: text('kind', {
			enum: SECTION_KINDS
		}).notNull(),
		title: text('title').notNull().default(''),
		startsAt: integer('starts_at', { mode: 'timestamp_ms' }).notNull(),
		endsAt: integer('ends_at', { mode: 'timestamp_ms' }).notNull(),
		/** The dance taught in a lesson. */
		danceId: integer('dance_id').references(() => dances.id, { onDelete: 'set null' }),
		/** Who teaches it. */
		teacherId: integer('teacher_id').references(() => users.id, { onDelete: 'set null' })
	},
	(t) => [
		check('sections_times', sql`${t.endsAt} > ${t.startsAt}`),
		check('sections_kind', sql`${t.kind} IN (${oneOf(SECTION_KINDS)})`),
		uniqueIndex('sections_evening_position').on(t.eveningId, t.position)
	]
);

export const runOrderEntries = sqliteTable(
	'run_order_entries',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		eveningId: integer('evening_id')
			.notNull()
			.references(() => evenings.id, { onDelete: 'cascade' }),
		position: integer('position').notNull(),
		kind: text('kind', {
			enum: ENTRY_KINDS
		}).notNull(),
		sectionId: integer('section_id').references(() => sections.id, { onDelete: 'set null' }),
		danceId: integer('dance_id').references(() => dances.id, { onDelete: 'set null' }),
		trackId: integer('track_id').references(() => tracks.id, { onDelete: 'set null' }),
		rate: real('rate').notNull().default(1),
		/** Seconds from the evening's start. */
		startS: real('start_s').notNull().default(0),
		durationS: real('duration_s').notNull().default(0),
		locked: integer('locked', { mode: 'boolean' }).notNull().default(false),
		/** Announcement text, or a title for a teach or break. */
		text: text('text').notNull().default(''),
		reasons: text('reasons', { mode: 'json' }).$type<string[]>().notNull().default([])
	},
	(t) => [
		check('entries_kind', sql`${t.kind} IN (${oneOf(ENTRY_KINDS)})`),
		check('entries_rate', sql`${t.rate} > 0.25 AND ${t.rate} < 4`),
		check('entries_duration', sql`${t.durationS} >= 0`),
		uniqueIndex('entries_evening_position').on(t.eveningId, t.position)
	]
);

export const requests = sqliteTable(
	'requests',
	{
		id: integer('id').primaryKey({ autoIncrement: true }),
		/** Null for a standing request (an instructor asking the DJ for slower music). */
		eveningId: integer('evening_id').references(() => evenings.id, { onDelete: 'cascade' }),
		kind: text('kind', { enum: ['dance', 'slower-music'] })
			.notNull()
			.default('dance'),
		danceId: integer('dance_id').references(() => dances.id, { onDelete: 'set null' }),
		/** What a dancer typed when the dance is not in the catalogue. */
		danceName: text('dance_name').notNull().default(''),
		message: text('message').notNull().default(''),
		requesterId: integer('requester_id').references(() => users.id, { onDelete: 'set null' }),
		requesterName: text('requester_name').notNull().default(''),
		status: text('status', { enum: ['open', 'planned', 'played', 'declined', 'done'] })
			.notNull()
			.default('open'),
		/** The team's word back to the dancer, and the track they mean to play, if they said. */
		answer: text('answer').notNull().default(''),
		answerTrackId: integer('answer_track_id').references(() => tracks.id, {
			onDelete: 'set null'
		}),
		answeredAt: integer('answered_at', { mode: 'timestamp_ms' }),
		createdAt: createdAt()
	},
	(t) => [
		check('requests_kind', sql`${t.kind} IN ('dance','slower-music')`),
		check('requests_status', sql`${t.status} IN ('open','planned','played','declined','done')`),
		index('requests_evening_idx').on(t.eveningId)
	]
);

/** Team-wide settings (rate bound, lesson slow-downs, planner weights) as JSON values. */
export const settings = sqliteTable('settings', {
	key: text('key').primaryKey(),
	value: text('value', { mode: 'json' }).notNull(),
	updatedAt: updatedAt()
});

/**
 * One counter per table that a cache holds, bumped by triggers (migration 0007) on every insert,
 * update and delete, by whichever code path or connection writes. A cache reads the counters of
 * the tables it holds (cache/change-stamp.ts), so a write elsewhere (a failed sign-in, the
 * outbox) leaves it be.
 */
export const dataChanges = sqliteTable('data_changes', {
	tableName: text('table_name').primaryKey(),
	version: integer('version').notNull().default(0)
});
