// What the public page shows a dancer: only facts meant for the floor. No e-mails, no people's
// names beyond a teacher's first name, no notes, no announcements' text, no choice reasons.
import { and, asc, desc, eq, isNotNull, ne } from 'drizzle-orm';
import type { EntryKind, Level, SectionKind } from '../../domain';
import { config } from '../config';
import { db } from '../db';
import { dances, requests } from '../db/schema';
import { loadSheet } from './load-sheet';
import { eveningIdByToken } from './publish';

export interface PublicEvening {
	id: number;
	title: string;
	venue: string;
	startsAt: number;
	endsAt: number;
	timeZone: string;
	shareUrl: string;
	sections: {
		kind: SectionKind;
		title: string;
		startsAt: number;
		endsAt: number;
		danceName: string | null;
		teacherFirstName: string | null;
	}[];
	entries: {
		position: number;
		kind: Exclude<EntryKind, 'announcement'>;
		startsAt: number;
		durationS: number;
		danceName: string | null;
		level: Level | null;
		/** Said on the page, so dancers find a partner in time. */
		partner: boolean;
	}[];
}

const PUBLIC_KINDS = ['dance', 'teach', 'walkthrough', 'break'] as const;
const isPublicKind = (k: EntryKind): k is (typeof PUBLIC_KINDS)[number] =>
	(PUBLIC_KINDS as readonly string[]).includes(k);

/** The published evening behind a share token, or null (unknown, malformed or unpublished). */
export function publicEvening(token: string): PublicEvening | null {
	const id = eveningIdByToken(token);
	if (id === null) return null;
	const sheet = loadSheet(id, config().origin);
	if (!sheet?.shareUrl) return null;
	return {
		id: sheet.id,
		title: sheet.title,
		venue: sheet.venue,
		startsAt: sheet.startsAt,
		endsAt: sheet.endsAt,
		timeZone: sheet.timeZone,
		shareUrl: sheet.shareUrl,
		sections: sheet.sections.map((s) => ({ ...s })),
		entries: sheet.entries.flatMap((e) => {
			const kind = e.kind;
			if (!isPublicKind(kind)) return [];
			return [
				{
					position: e.position,
					kind,
					startsAt: e.startsAt,
					durationS: e.durationS,
					danceName: e.danceName,
					level: e.level,
					partner: e.kind === 'dance' && e.formation === 'partner'
				}
			];
		})
	};
}

export interface PublicAnswer {
	danceName: string;
	status: 'planned' | 'declined' | 'done' | 'played';
	answer: string;
}

/**
 * The team's answers to this evening's requests, for everyone on the page: the dance, the
 * outcome and the team's words. Never who asked, nor the track (the page names no music).
 */
export function publicAnswers(eveningId: number): PublicAnswer[] {
	const rows = db()
		.select({
			catalogueName: dances.name,
			typedName: requests.danceName,
			status: requests.status,
			answer: requests.answer
		})
		.from(requests)
		.leftJoin(dances, eq(dances.id, requests.danceId))
		.where(
			and(
				eq(requests.eveningId, eveningId),
				eq(requests.kind, 'dance'),
				ne(requests.status, 'open'),
				isNotNull(requests.answeredAt)
			)
		)
		.orderBy(desc(requests.answeredAt))
		.limit(30)
		.all();
	return rows.map((r) => ({
		danceName: r.catalogueName ?? r.typedName,
		status: r.status as PublicAnswer['status'],
		answer: r.answer
	}));
}

/** The catalogue a dancer may pick from: names and levels only. */
export function requestableDances() {
	return db()
		.select({ id: dances.id, name: dances.name, level: dances.level })
		.from(dances)
		.orderBy(asc(dances.name))
		.all();
}

export interface DanceRequest {
	danceId?: number;
	danceName: string;
	message: string;
	name: string;
}

/** Stores a dancer's wish for the organiser and DJ; null when it names no dance we know of. */
export function storeRequest(eveningId: number, input: DanceRequest, requesterId: number | null) {
	const dance = input.danceId
		? db().select({ id: dances.id }).from(dances).where(eq(dances.id, input.danceId)).get()
		: undefined;
	if (!dance && !input.danceName) return null;
	return db()
		.insert(requests)
		.values({
			eveningId,
			kind: 'dance',
			danceId: dance?.id ?? null,
			danceName: dance ? '' : input.danceName,
			message: input.message,
			requesterId,
			requesterName: input.name,
			status: 'open'
		})
		.returning({ id: requests.id })
		.get();
}
