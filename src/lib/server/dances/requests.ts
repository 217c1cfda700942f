// Requests the team answers: instructors' standing requests for slower music for a dance, and
// dancers' requests for an evening (written by the evenings pages; listed and answered here).
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import type { SessionUser } from '../users';
import { holds } from '../guard';
import { db } from '../db';
import { dances, evenings, requests } from '../db/schema';

export type RequestStatus = (typeof requests.$inferSelect)['status'];

export interface RequestItem {
	id: number;
	kind: 'dance' | 'slower-music';
	status: RequestStatus;
	danceId: number | null;
	danceName: string;
	message: string;
	requesterId: number | null;
	requesterName: string;
	eveningId: number | null;
	eveningTitle: string | null;
	eveningStartsAt: string | null;
	createdAt: string;
}

/** Marking requests done or declined is the DJ's and the organiser's job (and admin's). */
export const canAnswerRequests = (user: SessionUser | null) =>
	holds(user, 'tracks') || holds(user, 'evenings');

/** Everything for the team; a dancer only sees what they asked for. */
export function listRequests(viewer: SessionUser): RequestItem[] {
	const team = viewer.roles.some((r) => r !== 'dancer');
	const rows = db()
		.select({
			id: requests.id,
			kind: requests.kind,
			status: requests.status,
			danceId: requests.danceId,
			catalogueName: dances.name,
			typedName: requests.danceName,
			message: requests.message,
			requesterId: requests.requesterId,
			requesterName: requests.requesterName,
			eveningId: requests.eveningId,
			eveningTitle: evenings.title,
			eveningStartsAt: evenings.startsAt,
			createdAt: requests.createdAt
		})
		.from(requests)
		.leftJoin(dances, eq(dances.id, requests.danceId))
		.leftJoin(evenings, eq(evenings.id, requests.eveningId))
		.where(team ? undefined : eq(requests.requesterId, viewer.id))
		.orderBy(sql`${requests.status} <> 'open'`, desc(requests.createdAt), desc(requests.id))
		.all();
	return rows.map(({ catalogueName, typedName, eveningStartsAt, createdAt, ...r }) => ({
		...r,
		danceName: catalogueName ?? typedName,
		eveningStartsAt: eveningStartsAt ? eveningStartsAt.toISOString() : null,
		createdAt: createdAt.toISOString()
	}));
}

export function requestSlowerMusic(danceId: number, message: string, user: SessionUser) {
	return db()
		.insert(requests)
		.values({
			kind: 'slower-music',
			danceId,
			message,
			requesterId: user.id,
			requesterName: user.name
		})
		.returning()
		.get();
}

/** Open standing requests for slower music for one dance, newest first. */
export function openSlowerMusicRequests(danceId: number) {
	return db()
		.select()
		.from(requests)
		.where(
			and(
				eq(requests.danceId, danceId),
				eq(requests.kind, 'slower-music'),
				eq(requests.status, 'open'),
				isNull(requests.eveningId)
			)
		)
		.orderBy(desc(requests.createdAt))
		.all();
}

export function setRequestStatus(id: number, status: RequestStatus): boolean {
	const row = db()
		.update(requests)
		.set({ status })
		.where(eq(requests.id, id))
		.returning({ id: requests.id })
		.get();
	return !!row;
}
