// Step sheets: PDF files only, recognised by their bytes (a PDF begins with "%PDF-", ISO 32000-1
// §7.5.2), never by the name or the type the browser claims. Stored under sheets/<sha256>.pdf.
import { createHash } from 'node:crypto';
import { config } from '../config';
import { storage } from '../storage';
import { setStepSheet, sheetInUse } from './catalogue';

/** 10 MB is plenty for a few pages of steps; the upload limit may be lower still. */
export const MAX_SHEET_BYTES = 10 * 1024 * 1024;

export const maxSheetBytes = () =>
	Math.min(MAX_SHEET_BYTES, Math.floor(config().MAX_UPLOAD_MB * 1024 * 1024));

const MAGIC = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"

export function looksLikePdf(bytes: Uint8Array): boolean {
	return bytes.length > MAGIC.length && MAGIC.every((b, i) => bytes[i] === b);
}

export type SheetCheck = { ok: true } | { ok: false; error: string };

export function checkSheet(bytes: Uint8Array, max = maxSheetBytes()): SheetCheck {
	if (bytes.length === 0) return { ok: false, error: 'The step sheet file is empty.' };
	if (bytes.length > max) {
		return {
			ok: false,
			error: `The step sheet is larger than ${Math.round(max / 1024 / 1024)} MB.`
		};
	}
	if (!looksLikePdf(bytes)) return { ok: false, error: 'A step sheet must be a PDF file.' };
	return { ok: true };
}

/** A safe download name: letters, digits, spaces, dots and dashes, ending in .pdf. */
export function sheetName(original: string): string {
	const base = original
		.replace(/\.pdf$/i, '')
		.replace(/[^\p{L}\p{N} ._-]+/gu, '')
		.trim()
		.slice(0, 80);
	return `${base || 'step-sheet'}.pdf`;
}

/** Checks, stores and attaches a sheet to the dance; the previous sheet goes if unused. */
export async function attachSheet(
	danceId: number,
	file: { bytes: Uint8Array; name: string }
): Promise<SheetCheck> {
	const check = checkSheet(file.bytes);
	if (!check.ok) return check;
	const key = `sheets/${createHash('sha256').update(file.bytes).digest('hex')}.pdf`;
	await storage().put(key, file.bytes);
	const previous = setStepSheet(danceId, key, sheetName(file.name));
	if (previous && previous !== key && !sheetInUse(previous)) await storage().remove(previous);
	return { ok: true };
}

export async function detachSheet(danceId: number): Promise<void> {
	const previous = setStepSheet(danceId, null, null);
	if (previous && !sheetInUse(previous)) await storage().remove(previous);
}

/** Removes a deleted dance's sheet when nothing else uses it. */
export async function forgetSheet(key: string | null): Promise<void> {
	if (key && !sheetInUse(key)) await storage().remove(key);
}
