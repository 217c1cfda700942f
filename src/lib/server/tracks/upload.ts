// POST /api/tracks, the pipeline: size, the browser's analysis (zod), the server's own look at
// the bytes, SHA-256 dedupe, then the file and the row. The file is written first (atomically,
// under a key made from its hash) and the row second; if the row cannot be written the file is
// removed again, so a failure leaves neither. A crash between the two leaves a file without a
// row, which the start-up sweep removes.
import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describeIssue } from '../json-body';
import { analysisSchema, type Analysis } from '../../music/track-schemas';
import { defaultPhraseBeats, type TrackJson } from '../../music/track-types';
import { config } from '../config';
import { db } from '../db';
import { tracks } from '../db/schema';
import { storage, type Storage } from '../storage';
import { cleanText as clean, displayName, titleFromName } from './display-name';
import { inspectAudio, type AudioFacts } from './inspect-audio';
import { toTrackJson } from './track-json';

export interface UploadInput {
	bytes: Uint8Array;
	/** The name the browser sent: display text only. */
	fileName: string;
	/** The `analysis` form field, as sent (JSON text). */
	analysis: string | null;
	uploadedBy: number | null;
}

export type UploadResult =
	| { ok: true; status: 201 | 200; duplicate: boolean; track: TrackJson }
	| { ok: false; status: 400 | 413 | 415 | 422 | 507; error: string };

export const maxUploadBytes = () => Math.floor(config().MAX_UPLOAD_MB * 1024 * 1024);

export const tooLarge = (): UploadResult => ({
	ok: false,
	status: 413,
	error: `The file is larger than the ${config().MAX_UPLOAD_MB} MB limit.`
});

type Refusal = Extract<UploadResult, { ok: false }>;

function readAnalysis(text: string | null): { ok: true; data: Analysis } | Refusal {
	if (text === null || text.trim() === '') {
		return { ok: false, status: 400, error: 'The analysis is missing: send it as JSON.' };
	}
	let value: unknown;
	try {
		value = JSON.parse(text);
	} catch {
		return { ok: false, status: 400, error: 'The analysis is not valid JSON.' };
	}
	const parsed = analysisSchema.safeParse(value);
	if (!parsed.success) {
		return { ok: false, status: 422, error: `The analysis: ${describeIssue(parsed.error)}` };
	}
	return { ok: true, data: parsed.data };
}

export function rowValues(facts: AudioFacts, a: Analysis, name: string) {
	const measured = a.bpm ?? null;
	// Without a measurement the file's own BPM tag is the best we have, and says so.
	const bpm = measured ?? facts.tagBpm ?? null;
	const bpmSource = measured === null && bpm !== null ? ('tag' as const) : a.source;
	return {
		title: clean(facts.title ?? a.title) || titleFromName(name),
		artist: clean(facts.artist ?? a.artist),
		album: clean(facts.album ?? a.album),
		durationS: facts.durationS,
		bpm,
		rawBpm: a.rawBpm ?? measured,
		bpmSource,
		offsetS: Math.min(a.offsetS, facts.durationS),
		confidence: measured === null ? null : (a.confidence ?? null),
		altBpm: measured === null ? null : (a.alternative ?? null),
		candidates: a.candidates,
		meter: a.meter,
		phraseBeats: defaultPhraseBeats(a.meter),
		tagBpm: facts.tagBpm ?? null,
		format: facts.format,
		mimeType: facts.mimeType
	};
}

const bySha = (sha256: string) => db().select().from(tracks).where(eq(tracks.sha256, sha256)).get();

export async function uploadTrack(
	input: UploadInput,
	store: Storage = storage()
): Promise<UploadResult> {
	if (input.bytes.length > maxUploadBytes()) return tooLarge();
	const analysis = readAnalysis(input.analysis);
	if (!analysis.ok) return analysis;
	const inspection = await inspectAudio(input.bytes);
	if (!inspection.ok) return inspection;
	const { facts } = inspection;

	const sha256 = createHash('sha256').update(input.bytes).digest('hex');
	const existing = bySha(sha256);
	if (existing) return { ok: true, status: 200, duplicate: true, track: toTrackJson(existing) };

	const name = displayName(input.fileName);
	const storageKey = `audio/${sha256}.${facts.ext}`;
	try {
		await store.put(storageKey, input.bytes);
	} catch (e) {
		// A full disk or an unwritable upload folder: say so plainly; nothing was stored.
		const code = (e as NodeJS.ErrnoException).code ?? '';
		if (!['ENOSPC', 'EACCES', 'EPERM', 'EROFS', 'EDQUOT', 'ENOENT'].includes(code)) throw e;
		console.error(`Upload could not be stored (${code}):`, (e as Error).message);
		return {
			ok: false,
			status: 507,
			error:
				'The server could not store the file: its disk is full or the upload folder is not writable. Nothing was saved; tell whoever runs Floorset.'
		};
	}
	try {
		const row = db()
			.insert(tracks)
			.values({
				...rowValues(facts, analysis.data, name),
				fileSize: input.bytes.length,
				sha256,
				storageKey,
				originalName: name,
				uploadedBy: input.uploadedBy
			})
			.returning()
			.get();
		return { ok: true, status: 201, duplicate: false, track: toTrackJson(row) };
	} catch (e) {
		// The same file uploaded twice at once: the other request's row owns the file now.
		const winner = bySha(sha256);
		if (winner) return { ok: true, status: 200, duplicate: true, track: toTrackJson(winner) };
		await store.remove(storageKey);
		throw e;
	}
}
