// The evening kit: one zip the DJ takes to the laptop that drives the speakers. It holds the
// night's audio in run order, a playlist that names those files relatively (so it plays with
// no network and no session), the run order as CSV and the printable run sheet. Streamed with
// yazl, audio stored as it is (already compressed), so a night of music never sits in memory.
import { Readable } from 'node:stream';
import { ZipFile } from 'yazl';
import { inArray } from 'drizzle-orm';
import { db } from '../db';
import { tracks } from '../db/schema';
import { storage } from '../storage';
import { buildCsv } from './csv';
import { buildM3u8, playlistEntries } from './m3u8';
import { buildPdf } from './pdf';
import { rateText, type RunSheet, type SheetEntry } from './sheet';
import { CARE_NOTE, SOUND_CAUTION } from './cautions';

/** Characters Windows, macOS or a FAT stick refuse in a file name, and control characters. */
// eslint-disable-next-line no-control-regex
const UNSAFE = /[<>:"/\\|?*\u0000-\u001f\u007f]/g;

/** One part of a file name: safe on every common file system and at most `max` characters. */
export function namePart(text: string | null, max = 60): string {
	const clean = (text ?? '').normalize('NFC').replace(UNSAFE, ' ').replace(/\s+/g, ' ').trim();
	const cut = [...clean].slice(0, max).join('').trim();
	// Windows drops trailing dots and spaces, which would make two names collide.
	return cut.replace(/[. ]+$/, '');
}

/** `NN - Title - Artist.ext`, numbered in playing order with at least two digits. */
export function kitFileName(
	number: number,
	count: number,
	entry: Pick<SheetEntry, 'trackTitle' | 'artist'>,
	ext: string
): string {
	const width = Math.max(2, String(count).length);
	const parts = [
		String(number).padStart(width, '0'),
		namePart(entry.trackTitle) || 'Untitled',
		namePart(entry.artist)
	].filter(Boolean);
	return `${parts.join(' - ')}.${ext}`;
}

/** A file of the kit that holds a track's audio. */
export interface KitAudio {
	entry: SheetEntry & { trackId: number };
	name: string;
	key: string;
	size: number;
}

export interface KitPlan {
	audio: KitAudio[];
	/** Dances whose track's audio is not on the server: named in the read-me and playlist. */
	missing: (SheetEntry & { trackId: number })[];
}

/** Which files go in, under which names: pure, so it is tested without a disk. */
export function planKit(
	sheet: RunSheet,
	fileOf: (trackId: number) => { key: string; size: number | null } | undefined
): KitPlan {
	const playable = playlistEntries(sheet);
	const found = playable.flatMap((entry) => {
		const file = fileOf(entry.trackId);
		return !entry.audioMissing && file && file.size !== null
			? [{ entry, key: file.key, size: file.size }]
			: [];
	});
	const audio = found.map((f, i) => ({
		...f,
		name: kitFileName(i + 1, found.length, f.entry, f.key.split('.').pop() ?? 'audio')
	}));
	const inKit = new Set(audio.map((a) => a.entry.position));
	return { audio, missing: playable.filter((e) => !inKit.has(e.position)) };
}

/** The playlist inside the kit: each entry's file, relative to the playlist itself. */
export function kitPlaylist(sheet: RunSheet, plan: KitPlan): string {
	const byPosition = new Map(plan.audio.map((a) => [a.entry.position, a.name]));
	// Desktop players read a local playlist's lines as paths beside it, so names are written as
	// they are on disk (not percent-encoded) and the kit keeps every file in one folder.
	return buildM3u8(sheet, (e) => byPosition.get(e.position) ?? null);
}

export function kitReadMe(sheet: RunSheet, plan: KitPlan): string {
	const lines = [
		sheet.title,
		'',
		'Unpack every file into one folder, then open run-order.m3u8 in any music player.',
		'The numbers at the front of the audio files keep them in run order as well.',
		'run-order.csv is the whole run order for a spreadsheet; run-sheet.pdf is for printing.'
	];
	const changed = plan.audio.filter((a) => a.entry.rate !== 1);
	if (changed.length) {
		lines.push('', 'Set these in the player, which plays a file as recorded:');
		for (const a of changed) lines.push(`  ${a.name}: play at ${rateText(a.entry.rate)}`);
	}
	if (plan.missing.length) {
		lines.push('', 'Not in the kit (the audio is not on the server):');
		for (const e of plan.missing) lines.push(`  ${e.position}. ${e.trackTitle ?? e.danceName}`);
	}
	lines.push('', SOUND_CAUTION, '', CARE_NOTE);
	// CRLF, so the one text file reads right in the simplest editor on any laptop.
	return lines.join('\r\n') + '\r\n';
}

function trackFiles(sheet: RunSheet) {
	const ids = [...new Set(playlistEntries(sheet).map((e) => e.trackId))];
	if (ids.length === 0) return new Map<number, string>();
	const rows = db()
		.select({ id: tracks.id, key: tracks.storageKey })
		.from(tracks)
		.where(inArray(tracks.id, ids))
		.all();
	return new Map(rows.map((r) => [r.id, r.key]));
}

/** The kit as a zip stream and its exact length (every entry stored, so yazl can add it up). */
export async function buildKit(
	sheet: RunSheet
): Promise<{ body: ReadableStream<Uint8Array>; size: number }> {
	const keys = trackFiles(sheet);
	const sizes = new Map<string, number | null>();
	for (const key of keys.values()) sizes.set(key, await storage().size(key));
	const plan = planKit(sheet, (id) => {
		const key = keys.get(id);
		return key === undefined ? undefined : { key, size: sizes.get(key) ?? null };
	});

	const zip = new ZipFile();
	const stored = { compress: false, mtime: new Date(sheet.startsAt) };
	for (const a of plan.audio) {
		// Lazily, so one file is open at a time however long the night is.
		zip.addReadStreamLazy(a.name, { ...stored, size: a.size }, (done) =>
			done(null, Readable.fromWeb(storage().read(a.key) as never))
		);
	}
	zip.addBuffer(Buffer.from(kitPlaylist(sheet, plan)), 'run-order.m3u8', stored);
	zip.addBuffer(Buffer.from(buildCsv(sheet)), 'run-order.csv', stored);
	zip.addBuffer(await buildPdf(sheet), 'run-sheet.pdf', stored);
	zip.addBuffer(Buffer.from(kitReadMe(sheet, plan)), 'read-me.txt', stored);
	const size = await new Promise<number>((resolve) => zip.end(undefined, resolve as () => void));
	return { body: Readable.toWeb(zip.outputStream as Readable) as ReadableStream<Uint8Array>, size };
}
