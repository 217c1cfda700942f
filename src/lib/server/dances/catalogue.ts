// The dance catalogue: list with filters, read, create, update (with a version check), delete.
import { and, asc, eq, gte, lte, or, sql, type SQL } from 'drizzle-orm';
import {
	danceSchema,
	type DanceFilter,
	type DanceInput,
	type DancePatch
} from '../../schemas/dance';
import { describeIssue } from '../json-body';
import { db } from '../db';
import { dances } from '../db/schema';
import { columnsOf, danceJson, type DanceJson, type DanceRow } from './dance-json';

/** `%` and `_` typed by a person are literal characters, not wildcards. */
const likeText = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

export function listDances(filter: DanceFilter = {}): DanceJson[] {
	const where: SQL[] = [];
	if (filter.q) {
		const pattern = likeText(filter.q);
		where.push(
			or(
				sql`${dances.name} LIKE ${pattern} ESCAPE '\\'`,
				sql`${dances.choreographer} LIKE ${pattern} ESCAPE '\\'`,
				sql`${dances.notes} LIKE ${pattern} ESCAPE '\\'`
			)!
		);
	}
	if (filter.level) where.push(eq(dances.level, filter.level));
	if (filter.rhythm) where.push(eq(dances.rhythm, filter.rhythm));
	if (filter.meter) where.push(eq(dances.meter, filter.meter));
	if (filter.formation) where.push(eq(dances.formation, filter.formation));
	if (filter.counts) where.push(eq(dances.counts, filter.counts));
	if (filter.walls) where.push(eq(dances.walls, filter.walls));
	if (filter.tempo) where.push(lte(dances.bpmMin, filter.tempo), gte(dances.bpmMax, filter.tempo));
	return db()
		.select()
		.from(dances)
		.where(where.length ? and(...where) : undefined)
		.orderBy(asc(sql`lower(${dances.name})`), asc(dances.id))
		.all()
		.map(danceJson);
}

export const danceRow = (id: number): DanceRow | undefined =>
	db().select().from(dances).where(eq(dances.id, id)).get();

export function getDance(id: number): DanceJson | null {
	const row = danceRow(id);
	return row ? danceJson(row) : null;
}

export function createDance(input: DanceInput, userId: number | null): DanceJson {
	const row = db()
		.insert(dances)
		.values({ ...columnsOf(input), createdBy: userId })
		.returning()
		.get();
	return danceJson(row);
}

/** The fields of a stored dance in input shape, to merge a PATCH into. */
function inputOf(d: DanceJson): DanceInput {
	const { name, counts, walls, level, rhythm, meter, bpmMin, bpmMax, turn, formation } = d;
	const { tags, restarts, notes, choreographer, wellKnown } = d;
	return {
		...{ name, counts, walls, level, rhythm, meter, bpmMin, bpmMax, turn, formation },
		...{ tags, restarts, notes, choreographer, wellKnown }
	};
}

export type UpdateResult =
	| { ok: true; dance: DanceJson }
	| { ok: false; status: 404 | 409 | 422; error: string; current?: DanceJson };

/**
 * Applies the changed fields if `version` is still the stored one; a stale version is refused
 * (409) so two people editing the same dance never overwrite each other unseen.
 */
export function updateDance(id: number, patch: DancePatch): UpdateResult {
	return db().transaction((tx) => {
		const row = tx.select().from(dances).where(eq(dances.id, id)).get();
		if (!row) return { ok: false, status: 404, error: 'No such dance.' } as const;
		const current = danceJson(row);
		if (row.version !== patch.version) {
			return {
				ok: false,
				status: 409,
				error: 'Someone changed this dance meanwhile. Reload it and make your change again.',
				current
			} as const;
		}
		const { version, ...fields } = patch;
		const merged = danceSchema.safeParse({ ...inputOf(current), ...stripUndefined(fields) });
		if (!merged.success) {
			return { ok: false, status: 422, error: describeIssue(merged.error) } as const;
		}
		const saved = tx
			.update(dances)
			.set({ ...columnsOf(merged.data), version: version + 1, updatedAt: new Date() })
			.where(and(eq(dances.id, id), eq(dances.version, version)))
			.returning()
			.get();
		if (!saved) return { ok: false, status: 409, error: 'Someone changed this dance meanwhile.' };
		return { ok: true, dance: danceJson(saved) } as const;
	});
}

function stripUndefined<T extends object>(o: T): Partial<T> {
	return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/** Deletes the dance; its fits go with it (cascade). Returns the step sheet key to clean up. */
export function deleteDance(id: number): { deleted: boolean; sheetKey: string | null } {
	const row = db().delete(dances).where(eq(dances.id, id)).returning().get();
	return { deleted: !!row, sheetKey: row?.stepSheetKey ?? null };
}

/** Sets or clears the step sheet reference; bumps the version like any other change. */
export function setStepSheet(id: number, key: string | null, name: string | null): string | null {
	const row = danceRow(id);
	if (!row) return null;
	db()
		.update(dances)
		.set({
			stepSheetKey: key,
			stepSheetName: name,
			version: row.version + 1,
			updatedAt: new Date()
		})
		.where(eq(dances.id, id))
		.run();
	return row.stepSheetKey;
}

/** Whether any other dance still points at this sheet (the same PDF may serve two dances). */
export function sheetInUse(key: string): boolean {
	return !!db().select({ id: dances.id }).from(dances).where(eq(dances.stepSheetKey, key)).get();
}
