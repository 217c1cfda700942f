// Creating, changing and deleting evenings with their sections, in one transaction each.
import { and, eq, inArray, sql } from 'drizzle-orm';
import type { EveningCreate, EveningPatch, SectionInput } from '../../schemas/evening';
import { db } from '../db';
import { dances, evenings, sections, userRoles, users } from '../db/schema';
import { EveningError } from './errors';
import { timeProblem } from './section-rules';

type Tx = Parameters<Parameters<ReturnType<typeof db>['transaction']>[0]>[0];

function checkRefs(tx: Tx, list: readonly SectionInput[]) {
	const danceIds = [...new Set(list.map((s) => s.danceId).filter((x): x is number => !!x))];
	if (danceIds.length) {
		const found = tx
			.select({ id: dances.id })
			.from(dances)
			.where(inArray(dances.id, danceIds))
			.all();
		if (found.length !== danceIds.length)
			throw new EveningError('A section names an unknown dance.', 422);
	}
	const teacherIds = [...new Set(list.map((s) => s.teacherId).filter((x): x is number => !!x))];
	if (teacherIds.length) {
		const found = tx
			.selectDistinct({ id: users.id })
			.from(users)
			.innerJoin(userRoles, eq(userRoles.userId, users.id))
			.where(
				and(
					inArray(users.id, teacherIds),
					inArray(userRoles.role, ['instructor', 'admin', 'organiser'])
				)
			)
			.all();
		if (found.length !== teacherIds.length)
			throw new EveningError('A lesson names a teacher who is not on the team.', 422);
	}
	for (const s of list) {
		if (s.kind !== 'lesson' && s.danceId)
			throw new EveningError('Only a lesson names the dance it teaches.', 422);
	}
}

/** Replaces the evening's sections: ids given keep their rows (and run-order links). */
function writeSections(tx: Tx, eveningId: number, list: readonly SectionInput[]) {
	const existing = tx
		.select({ id: sections.id })
		.from(sections)
		.where(eq(sections.eveningId, eveningId))
		.all();
	const known = new Set(existing.map((s) => s.id));
	for (const s of list) {
		if (s.id && !known.has(s.id))
			throw new EveningError(`Section ${s.id} is not part of this evening.`, 422);
	}
	const kept = new Set(list.map((s) => s.id).filter(Boolean));
	const gone = existing.filter((s) => !kept.has(s.id)).map((s) => s.id);
	if (gone.length) tx.delete(sections).where(inArray(sections.id, gone)).run();
	// Positions are unique per evening: park the kept rows out of the way before renumbering.
	tx.update(sections)
		.set({ position: sql`-1 - ${sections.position}` })
		.where(eq(sections.eveningId, eveningId))
		.run();
	const sorted = [...list].sort((a, b) => a.startsAt - b.startsAt);
	sorted.forEach((s, position) => {
		const values = {
			eveningId,
			position,
			kind: s.kind,
			title: s.title,
			startsAt: new Date(s.startsAt),
			endsAt: new Date(s.endsAt),
			danceId: s.kind === 'lesson' ? (s.danceId ?? null) : null,
			teacherId: s.kind === 'lesson' ? (s.teacherId ?? null) : null
		};
		if (s.id) tx.update(sections).set(values).where(eq(sections.id, s.id)).run();
		else tx.insert(sections).values(values).run();
	});
}

function check(startsAt: number, endsAt: number, list: readonly SectionInput[]) {
	const problem = timeProblem(startsAt, endsAt, list);
	if (problem) throw new EveningError(problem, 422);
}

/** A new draft evening; returns its id. */
export function createEvening(input: EveningCreate, createdBy: number | null): number {
	check(input.startsAt, input.endsAt, input.sections);
	return db().transaction((tx) => {
		checkRefs(tx, input.sections);
		const row = tx
			.insert(evenings)
			.values({
				title: input.title,
				venue: input.venue,
				startsAt: new Date(input.startsAt),
				endsAt: new Date(input.endsAt),
				crowd: input.crowd,
				notes: input.notes,
				planSettings: input.planSettings ?? {},
				createdBy
			})
			.returning({ id: evenings.id })
			.get();
		writeSections(tx, row.id, input.sections);
		return row.id;
	});
}

/** Changes the fields given; the evening's times and sections are checked together. */
export function updateEvening(id: number, patch: EveningPatch): void {
	db().transaction((tx) => {
		const row = tx.select().from(evenings).where(eq(evenings.id, id)).get();
		if (!row) throw new EveningError('There is no such evening.', 404);
		if (patch.version !== undefined && patch.version !== row.version)
			throw new EveningError(
				'Someone else changed this evening meanwhile. Reload to see their changes.',
				409,
				{
					currentVersion: row.version
				}
			);
		const startsAt = patch.startsAt ?? row.startsAt.getTime();
		const endsAt = patch.endsAt ?? row.endsAt.getTime();
		const list: SectionInput[] =
			patch.sections ??
			tx
				.select()
				.from(sections)
				.where(eq(sections.eveningId, id))
				.all()
				.map((s) => ({ ...s, startsAt: s.startsAt.getTime(), endsAt: s.endsAt.getTime() }));
		check(startsAt, endsAt, list);
		if (patch.sections) {
			checkRefs(tx, patch.sections);
			writeSections(tx, id, patch.sections);
		}
		tx.update(evenings)
			.set({
				title: patch.title ?? row.title,
				venue: patch.venue ?? row.venue,
				startsAt: new Date(startsAt),
				endsAt: new Date(endsAt),
				crowd: patch.crowd ?? row.crowd,
				notes: patch.notes ?? row.notes,
				planSettings: patch.planSettings ?? row.planSettings,
				updatedAt: new Date(),
				version: row.version + 1
			})
			.where(eq(evenings.id, id))
			.run();
	});
}

/** Deletes the evening, its sections, run order and requests (the foreign keys cascade). */
export function deleteEvening(id: number): boolean {
	return db().delete(evenings).where(eq(evenings.id, id)).run().changes > 0;
}
