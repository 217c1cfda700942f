// The start-up sweep: after a crash, no file may be left without its row nor a row without its
// file. Uploads write the file first and the row second, so a crash between the two leaves an
// orphan file (removed here). A row whose file has gone is never deleted (a partial restore or a
// late disk must not cost its verdicts and run-order places, issue 13 finding 4): it is marked
// "audio missing", and unmarked when its file is back. Both are logged.
import { eq, inArray, isNotNull } from 'drizzle-orm';
import { db } from './db';
import { dances, tracks } from './db/schema';
import { storage, type Storage } from './storage';

export interface SweepReport {
	temporaryFiles: number;
	orphanFiles: string[];
	/** Tracks newly marked "audio missing". */
	tracksWithoutFile: number[];
	/** Tracks marked before whose file is there again. */
	tracksFileBack?: number[];
	sheetsWithoutFile: number[];
	uploadDirLooksWrong?: boolean;
}

export async function sweepOrphans(
	store: Storage = storage(),
	now = Date.now()
): Promise<SweepReport> {
	const report: SweepReport = {
		temporaryFiles: await store.removeTemporary(),
		orphanFiles: [],
		tracksWithoutFile: [],
		sheetsWithoutFile: []
	};
	const trackRows = db()
		.select({ id: tracks.id, key: tracks.storageKey, missingAt: tracks.audioMissingAt })
		.from(tracks)
		.all();
	const sheetRows = db()
		.select({ id: dances.id, key: dances.stepSheetKey })
		.from(dances)
		.where(isNotNull(dances.stepSheetKey))
		.all();
	const known = new Set([...trackRows.map((r) => r.key), ...sheetRows.map((r) => r.key!)]);
	for (const key of [...(await store.keys('audio')), ...(await store.keys('sheets'))]) {
		if (!known.has(key)) {
			await store.remove(key);
			report.orphanFiles.push(key);
		}
	}
	const missing: typeof trackRows = [];
	const back: number[] = [];
	for (const row of trackRows) {
		const there = (await store.size(row.key)) !== null;
		if (!there) missing.push(row);
		else if (row.missingAt !== null) back.push(row.id);
	}
	if (back.length) {
		db().update(tracks).set({ audioMissingAt: null }).where(inArray(tracks.id, back)).run();
		report.tracksFileBack = back;
	}
	// Every file gone at once is a wrong UPLOAD_DIR, not a crash: mark nothing and say so.
	if (missing.length > 1 && missing.length === trackRows.length) {
		report.uploadDirLooksWrong = true;
	} else {
		const fresh = missing.filter((r) => r.missingAt === null).map((r) => r.id);
		if (fresh.length) {
			db().update(tracks).set({ audioMissingAt: now }).where(inArray(tracks.id, fresh)).run();
		}
		report.tracksWithoutFile = fresh;
	}
	for (const row of sheetRows) {
		if ((await store.size(row.key!)) === null) {
			db()
				.update(dances)
				.set({ stepSheetKey: null, stepSheetName: null })
				.where(eq(dances.id, row.id))
				.run();
			report.sheetsWithoutFile.push(row.id);
		}
	}
	return report;
}

export function describeSweep(r: SweepReport): string | null {
	const parts = [
		r.temporaryFiles && `${r.temporaryFiles} half-written file(s) removed`,
		r.orphanFiles.length && `${r.orphanFiles.length} file(s) without a row removed`,
		r.tracksWithoutFile.length &&
			`${r.tracksWithoutFile.length} track(s) marked "audio missing", rows kept (ids ${r.tracksWithoutFile.join(', ')})`,
		r.tracksFileBack?.length &&
			`${r.tracksFileBack.length} track(s) have their audio back (ids ${r.tracksFileBack.join(', ')})`,
		r.sheetsWithoutFile.length &&
			`${r.sheetsWithoutFile.length} missing step sheet(s) unlinked (dances ${r.sheetsWithoutFile.join(', ')})`
	].filter(Boolean);
	if (r.uploadDirLooksWrong) {
		parts.push('no track has its audio file: check UPLOAD_DIR (nothing was removed)');
	}
	return parts.length ? `Start-up sweep: ${parts.join('; ')}.` : null;
}
