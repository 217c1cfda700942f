// Integration tests of publishing, the public page's data, requests and the run-order e-mail,
// against a real SQLite with the real migrations (makeTestDb) and a small invented evening.
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import {
	dances,
	evenings,
	outbox,
	requests,
	runOrderEntries,
	sections,
	tracks
} from '../db/schema';
import { makeTestDb } from '../testing/test-db';
import { createUser } from '../users';
import { chooseRecipients, sendRunOrder } from './email';
import { loadSheet } from './load-sheet';
import { publicEvening, storeRequest } from './public-evening';
import { eveningIdByToken, publishEvening, TOKEN_SHAPE, unpublishEvening } from './publish';

const ORIGIN = 'http://floorset.example';
let t: ReturnType<typeof makeTestDb>;
let ids: { evening: number; dance: number; organiser: number; dj: number; dancer: number };

const at = (hm: string) => new Date(`2026-12-11T${hm}:00Z`);

function inventEvening() {
	const organiser = createUser({
		email: 'ottilie@club.example',
		name: 'Ottilie Brackwater',
		passwordHash: 'x',
		roles: ['organiser']
	}).id;
	const dj = createUser({
		email: 'dj@club.example',
		name: 'Rufus Fenmoor',
		passwordHash: 'x',
		roles: ['dj', 'instructor']
	}).id;
	const dancer = createUser({
		email: 'dancer@club.example',
		name: 'Ines Pollard',
		passwordHash: 'x',
		roles: ['dancer']
	}).id;
	// Invited but never signed in: no password, so no mail.
	createUser({ email: 'new@club.example', name: 'Una Tern', passwordHash: null, roles: ['dj'] });
	const dance = t.db
		.insert(dances)
		.values({
			name: 'Pebble Lane Stroll',
			counts: 32,
			walls: 4,
			level: 'beginner',
			bpmMin: 110,
			bpmMax: 130
		})
		.returning()
		.get().id;
	const track = t.db
		.insert(tracks)
		.values({
			title: 'Hayloft Lanterns',
			artist: 'The Wrenhill Five',
			durationS: 201.6,
			bpm: 120,
			mimeType: 'audio/mpeg',
			fileSize: 1000,
			sha256: 'a'.repeat(64),
			storageKey: `audio/${'a'.repeat(64)}.mp3`
		})
		.returning()
		.get().id;
	const evening = t.db
		.insert(evenings)
		.values({
			title: 'Thistlewick Barn Social',
			venue: 'Copperlane Hall',
			startsAt: at('19:00'),
			endsAt: at('22:00'),
			notes: 'Private: ask Rufus about the spare cable.'
		})
		.returning()
		.get().id;
	t.db
		.insert(sections)
		.values({
			eveningId: evening,
			position: 0,
			kind: 'lesson',
			startsAt: at('19:00'),
			endsAt: at('19:30'),
			danceId: dance,
			teacherId: dj
		})
		.run();
	t.db
		.insert(runOrderEntries)
		.values([
			{ eveningId: evening, position: 0, kind: 'teach', danceId: dance, trackId: track, rate: 0.9 },
			{
				eveningId: evening,
				position: 1,
				kind: 'announcement',
				startS: 1200,
				durationS: 60,
				text: 'Thank Rufus Fenmoor for the urn'
			},
			{
				eveningId: evening,
				position: 2,
				kind: 'dance',
				danceId: dance,
				trackId: track,
				startS: 1260,
				durationS: 224
			}
		])
		.run();
	ids = { evening, dance, organiser, dj, dancer };
}

beforeEach(() => {
	t = makeTestDb();
	inventEvening();
});
afterEach(() => t.cleanup());

const row = () => t.db.select().from(evenings).where(eq(evenings.id, ids.evening)).get()!;

describe('run sheet from the database', () => {
	test('joins dances and tracks, adds each track’s own length and the teacher’s first name', () => {
		const sheet = loadSheet(ids.evening, ORIGIN)!;
		expect(sheet.entries.map((e) => e.kind)).toEqual(['teach', 'announcement', 'dance']);
		expect(sheet.entries[2]).toMatchObject({
			position: 3,
			danceName: 'Pebble Lane Stroll',
			level: 'beginner',
			trackTitle: 'Hayloft Lanterns',
			trackDurationS: 201.6,
			bpm: 120,
			startsAt: at('19:21').getTime()
		});
		expect(sheet.sections[0].teacherFirstName).toBe('Rufus');
		expect(sheet.shareUrl).toBeNull();
		expect(loadSheet(9999, ORIGIN)).toBeNull();
	});
});

describe('publishing', () => {
	test('publish makes a random token and a link; publishing again keeps it; versions untouched', () => {
		const before = row();
		const token = publishEvening(ids.evening)!;
		expect(token).toMatch(TOKEN_SHAPE);
		// 18 random bytes in base64url are 24 characters (RFC 4648 §5: 4 characters per 3 bytes).
		expect(token).toHaveLength(24);
		expect(row()).toMatchObject({ status: 'published', shareToken: token });
		expect(row().version).toBe(before.version);
		expect(row().runOrderVersion).toBe(before.runOrderVersion);
		expect(publishEvening(ids.evening)).toBe(token);
		expect(eveningIdByToken(token)).toBe(ids.evening);
		expect(loadSheet(ids.evening, ORIGIN)!.shareUrl).toBe(`${ORIGIN}/e/${token}`);
		expect(publishEvening(9999)).toBeNull();
	});

	test('unpublish clears the token: the old link finds nothing, a new publish makes a new one', () => {
		const token = publishEvening(ids.evening)!;
		expect(unpublishEvening(ids.evening)).toBe(true);
		expect(row()).toMatchObject({ status: 'draft', shareToken: null });
		expect(eveningIdByToken(token)).toBeNull();
		expect(publicEvening(token)).toBeNull();
		const again = publishEvening(ids.evening)!;
		expect(again).not.toBe(token);
		expect(unpublishEvening(9999)).toBe(false);
	});

	test('a malformed token is not even looked up', () => {
		expect(eveningIdByToken("' OR 1=1 --")).toBeNull();
		expect(eveningIdByToken('short')).toBeNull();
	});
});

describe('the public page', () => {
	test('shows the floor’s facts and nothing private', () => {
		const token = publishEvening(ids.evening)!;
		const view = publicEvening(token)!;
		expect(view.title).toBe('Thistlewick Barn Social');
		expect(view.entries.map((e) => e.kind)).toEqual(['teach', 'dance']);
		expect(view.sections[0].teacherFirstName).toBe('Rufus');
		const all = JSON.stringify(view);
		for (const secret of ['@club.example', 'Fenmoor', 'Private', 'spare cable', 'urn', 'reasons']) {
			expect(all).not.toContain(secret);
		}
	});

	test('a request is stored for the organiser and DJ as kind dance', () => {
		const stored = storeRequest(
			ids.evening,
			{ danceId: ids.dance, danceName: '', message: 'Please!', name: 'Ines' },
			null
		)!;
		const typed = storeRequest(
			ids.evening,
			{ danceId: 424242, danceName: 'Something Off-List', message: '', name: '' },
			null
		)!;
		const rows = t.db.select().from(requests).all();
		expect(rows.find((r) => r.id === stored.id)).toMatchObject({
			eveningId: ids.evening,
			kind: 'dance',
			danceId: ids.dance,
			danceName: '',
			message: 'Please!',
			requesterName: 'Ines',
			status: 'open'
		});
		// An unknown id falls back to the typed name.
		expect(rows.find((r) => r.id === typed.id)).toMatchObject({
			danceId: null,
			danceName: 'Something Off-List'
		});
		expect(
			storeRequest(ids.evening, { danceId: 424242, danceName: '', message: '', name: '' }, null)
		).toBeNull();
	});
});

describe('e-mailing the run order', () => {
	test('recipients by role and by id, each once, only accounts in use', () => {
		expect(chooseRecipients({}).length).toBe(0);
		const byRole = chooseRecipients({ roles: ['dj'] }).map((p) => p.name);
		expect(byRole).toEqual(['Rufus Fenmoor']);
		const both = chooseRecipients({ roles: ['dj', 'instructor'], userIds: [ids.dj, ids.dancer] });
		expect(both.map((p) => p.id).sort()).toEqual([ids.dj, ids.dancer].sort());
	});

	test('one message each lands in the captured outbox with the CSV and the PDF attached', async () => {
		const sheet = loadSheet(ids.evening, ORIGIN)!;
		const people = chooseRecipients({ roles: ['organiser', 'dj'] });
		const sent = await sendRunOrder(sheet, people, {
			message: 'See you at seven.',
			origin: ORIGIN,
			senderName: 'Ottilie Brackwater'
		});
		expect(sent).toBe(2);
		const mail = t.db.select().from(outbox).all();
		expect(mail.map((m) => m.to).sort()).toEqual(['dj@club.example', 'ottilie@club.example']);
		for (const m of mail) {
			expect(m.subject).toBe('Run order: Thistlewick Barn Social (Friday 11 December 2026)');
			expect(m.text).toContain('See you at seven.');
			expect(m.text).toContain('19:21  Pebble Lane Stroll (Beginner) — Hayloft Lanterns');
			expect(m.text).toContain('100 dB LAeq');
			expect(m.attachments.map((a) => [a.filename, a.contentType])).toEqual([
				['thistlewick-barn-social-2026-12-11.csv', 'text/csv'],
				['thistlewick-barn-social-2026-12-11.pdf', 'application/pdf']
			]);
			expect(m.attachments.every((a) => a.size > 100)).toBe(true);
		}
	});
});
