// Requests the team answers: instructors' standing requests for slower music for a dance, and
// dancers' requests for an evening (written by the evenings pages; listed and answered here).
import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import type { SessionUser } from '../users';
import { holds } from '../guard';
import { db } from '../db';
import { dances, evenings, requests, tracks } from '../db/schema';

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
	/** The team's answer: a short message and, if they chose one, the track they will play. */
	answer: string;
	answerTrackId: number | null;
	answerTrackTitle: string | null;
	answeredAt: string | null;
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
			answer: requests.answer,
			answerTrackId: requests.answerTrackId,
			answerTrackTitle: tracks.title,
			answeredAt: requests.answeredAt,
			createdAt: requests.createdAt
		})
		.from(requests)
		.leftJoin(dances, eq(dances.id, requests.danceId))
		.leftJoin(tracks, eq(tracks.id, requests.answerTrackId))
		.leftJoin(evenings, eq(evenings.id, requests.eveningId))
		.where(team ? undefined : eq(requests.requesterId, viewer.id))
		.orderBy(sql`${requests.status} <> 'open'`, desc(requests.createdAt), desc(requests.id))
		.all();
	return rows.map(
		({
			catalogueName,
			typedName,
			eveningStartsAt,
			answeredAt,
			answerTrackTitle,
			createdAt,
			...r
		}) => ({
			...r,
			danceName: catalogueName ?? typedName,
			eveningStartsAt: eveningStartsAt ? eveningStartsAt.toISOString() : null,
			answerTrackTitle: answerTrackTitle ?? null,
			answeredAt: answeredAt ? answeredAt.toISOString() : null,
			createdAt: createdAt.toISOString()
		})
	);
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

export interface RequestAnswer {
	status: RequestStatus;
	/** Kept as it was when not given (a plain "Mark done" keeps the earlier answer). */
	answer?: string;
	trackId?: number | null;
}

/** Sets a request's status and the team's answer; false when there is no such request. */
export function answerRequest(id: number, a: RequestAnswer): boolean {
	const row = db()
		.update(requests)
		.set({
			status: a.status,
			...(a.answer !== undefined ? { answer: a.answer } : {}),
			...(a.trackId !== undefined ? { answerTrackId: a.trackId } : {}),
			answeredAt: a.status === 'open' ? null : new Date()
		})
		.where(eq(requests.id, id))
		.returning({ id: requests.id })
		.get();
	return !!row;
}

/** Dancers' requests for evenings still waiting for an answer: the navigation's count. */
export function waitingRequests(): number {
	const row = db()
		.select({ n: sql<number>`count(*)` })
		.from(requests)
		.where(eq(requests.status, 'open'))
		.get();
	return row?.n ?? 0;
}
