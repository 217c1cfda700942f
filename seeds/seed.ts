// Builds the invented demo club on an empty database: its team, dances, music (with generated
// audio stored like uploads), verdicts, two evenings and a few requests. Idempotent: a database
// that already has people is left alone.
import { createHash } from 'node:crypto';
import { parseBuffer } from 'music-metadata';
import { count } from 'drizzle-orm';
import type { Db } from '../src/lib/server/db';
import { dances, evenings, fits, requests, tracks, users } from '../src/lib/server/db/schema';
import { planAndSave } from '../src/lib/server/evenings/plan';
import { hashPassword } from '../src/lib/server/passwords';
import type { Storage } from '../src/lib/server/storage';
import { createUser } from '../src/lib/server/users';
import type { Role } from '../src/lib/domain';
import { demoAudio } from './audio';
import { DEMO_PASSWORD, PEOPLE } from './club';
import { DANCES, danceValues } from './dances';
import { seedEvenings } from './evenings';
import { TRACKS } from './tracks';

export interface SeedOptions {
	storage: Storage;
	cacheDir: string;
	log?: (line: string) => void;
}

export async function seedDemo(db: Db, options: SeedOptions): Promise<boolean> {
	const log = options.log ?? (() => {});
	const people = db.select({ n: count() }).from(users).get()?.n ?? 0;
	if (people > 0) {
		log('Database already has people; the demo seed is skipped.');
		return false;
	}
	const started = Date.now();
	log('Seeding the demo club (all invented)…');
	const audio = await demoAudio(TRACKS, options.cacheDir, log);
	const stored: { sha256: string; key: string; size: number; durationS: number }[] = [];
	for (const bytes of audio) {
		const sha256 = createHash('sha256').update(bytes).digest('hex');
		const key = `audio/${sha256}.mp3`;
		await options.storage.put(key, bytes);
		// Read the duration back from the file, as an upload would be.
		const meta = await parseBuffer(bytes, { mimeType: 'audio/mpeg', size: bytes.length });
		stored.push({ sha256, key, size: bytes.length, durationS: meta.format.duration ?? 0 });
	}

	const hash = await hashPassword(DEMO_PASSWORD);
	db.transaction((tx) => {
		for (const p of PEOPLE) {
			createUser({
				email: p.email,
				name: p.name,
				passwordHash: hash,
				roles: p.roles as readonly Role[]
			});
		}
		const ids = Object.fromEntries(
			tx
				.select({ id: users.id, email: users.email })
				.from(users)
				.all()
				.map((u) => [u.email, u.id])
		);
		const dj = ids['dj@floorset.test'];
		const instructor = ids['instructor@floorset.test'];

		const danceRows = DANCES.map((d) =>
			tx
				.insert(dances)
				.values({ ...danceValues(d), createdBy: instructor })
				.returning()
				.get()
		);
		const trackRows = TRACKS.map((t, i) =>
			tx
				.insert(tracks)
				.values({
					title: t.title,
					artist: t.artist,
					album: t.album,
					durationS: stored[i].durationS,
					bpm: t.bpm,
					rawBpm: t.bpm,
					// The seed knows the tempo it generated, so it is entered, not measured.
					bpmSource: 'entered',
					confidence: 1,
					offsetS: 0,
					meter: t.meter,
					phraseBeats: t.meter === 3 ? 24 : 32,
					introBeats: t.introBeats ?? 0,
					tagBpm: t.bpm,
					format: 'MPEG 1 Layer 3',
					mimeType: 'audio/mpeg',
					fileSize: stored[i].size,
					sha256: stored[i].sha256,
					storageKey: stored[i].key,
					originalName: `${t.artist} - ${t.title}.mp3`,
					uploadedBy: dj
				})
				.returning()
				.get()
		);
		// A few verdicts the DJ has already given, so the demo shows them outranking the guess.
		const byName = (n: string) => danceRows.find((d) => d.name === n)!.id;
		const byTitle = (n: string) => trackRows.find((t) => t.title === n)!.id;
		const verdicts: [string, string, 'fits' | 'fits-at-rate' | 'does-not-fit', number][] = [
			['Kettle Smoke at Dawn', 'Brackenfold Stroll', 'fits', 1],
			['Copper Penny Two-Step', 'Tansy Lane Two-Step', 'fits', 1],
			['The Lantern Keeper’s Waltz', 'Marrowby Lantern Waltz', 'fits', 1],
			['Cornflower Cha', 'Wrenmoor Cha', 'fits', 1],
			['Gingham and Gravel', 'Copperwick Kick', 'fits', 1],
			['Goodnight, Alder Row', 'Lanternlight Finale', 'fits', 1],
			['Sawdust on the Boards', 'Brackenfold Stroll', 'fits-at-rate', 0.95],
			['Nine Mile Bell', 'Harrowgate Heel Tap', 'does-not-fit', 1]
		];
		for (const [title, dance, verdict, rate] of verdicts) {
			tx.insert(fits)
				.values({ trackId: byTitle(title), danceId: byName(dance), verdict, rate, decidedBy: dj })
				.run();
		}
		seedEvenings(tx as unknown as Db, { ids, danceRows, trackRows });
		tx.insert(requests)
			.values({
				kind: 'slower-music',
				danceId: byName('Marrowby Lantern Waltz'),
				message: 'Something nearer 80 for the first lesson, please.',
				requesterId: instructor,
				requesterName: 'Dolores Fenwright'
			})
			.run();
	});
	// Plan both evenings with the real planner, as an organiser pressing "Plan" would.
	for (const e of db.select({ id: evenings.id, title: evenings.title }).from(evenings).all()) {
		const { plan } = planAndSave(e.id, 1);
		log(
			`  planned “${e.title}”: ${plan.entries.length} entries in ${plan.ms.toFixed(0)} ms, ${plan.unmet.length} wish(es) unmet`
		);
	}
	log(`Demo seeded in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
	return true;
}
