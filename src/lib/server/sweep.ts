// The start-up sweep: after a crash, no file may be left without its row nor a row without its
// file. Uploads write the file first and the row second, so a crash between the two leaves an
// orphan file (removed here); a row whose file has gone is removed too, and both are logged.
import { eq, isNotNull } from 'drizzle-orm';
import { db } from './db';
import { dances, tracks } from './db/schema';
import { storage, type Storage } from './storage';

export interface SweepReport {
	temporaryFiles: number;
	orphanFiles: string[];
	tracksWithoutFile: number[];
	sheetsWithoutFile: number[];
	uploadDirLooksWrong?: boolean;
}

export async function sweepOrphans(store: Storage = storage()): Promise<SweepReport> {
	const report: SweepReport = {
		temporaryFiles: await store.removeTemporary(),
		orphanFiles: [],
		tracksWithoutFile: [],
		sheetsWithoutFile: []
	};
	const trackRows = db().select({ id: tracks.id, key: tracks.storageKey }).from(tracks).all();
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
	const missing: number[] = [];
	for (const row of trackRows) if ((await store.size(row.key)) === null) missing.push(row.id);
	// Every file gone at once is a wrong UPLOAD_DIR, not a crash: keep the rows and say so.
	if (missing.length > 1 && missing.length === trackRows.length) {
		report.uploadDirLooksWrong = true;
	} else {
		for (const id of missing) db().delete(tracks).where(eq(tracks.id, id)).run();
		report.tracksWithoutFile = missing;
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
			`${r.tracksWithoutFile.length} track(s) whose audio was missing removed (ids ${r.tracksWithoutFile.join(', ')})`,
		r.sheetsWithoutFile.length &&
			`${r.sheetsWithoutFile.length} missing step sheet(s) unlinked (dances ${r.sheetsWithoutFile.join(', ')})`
	].filter(Boolean);
	if (r.uploadDirLooksWrong) {
		parts.push('no track has its audio file: check UPLOAD_DIR (nothing was removed)');
	}
	return parts.length ? `Start-up sweep: ${parts.join('; ')}.` : null;
}
