// Seeded-like data for the evenings' integration tests: the demo's invented team, dances, tracks
// (without audio), a few verdicts and its two evenings, written into a makeTestDb() database.
import type { Role } from '../../domain';
import type { Db } from '../db';
import { dances, fits, tracks, users } from '../db/schema';
import { createUser } from '../users';
import { PEOPLE } from '../../../../seeds/club';
import { DANCES, danceValues } from '../../../../seeds/dances';
import { seedEvenings } from '../../../../seeds/evenings';
import { TRACKS } from '../../../../seeds/tracks';

export function seedLike(db: Db) {
	for (const p of PEOPLE) {
		createUser({
			email: p.email,
			name: p.name,
			passwordHash: 'x',
			roles: p.roles as readonly Role[]
		});
	}
	const ids = Object.fromEntries(
		db
			.select()
			.from(users)
			.all()
			.map((u) => [u.email, u.id])
	) as Record<string, number>;
	const danceRows = DANCES.map((d) => db.insert(dances).values(danceValues(d)).returning().get());
	const trackRows = TRACKS.map((t, i) =>
		db
			.insert(tracks)
			.values({
				title: t.title,
				artist: t.artist,
				album: t.album,
				durationS: t.durationS,
				bpm: t.bpm,
				bpmSource: 'entered',
				meter: t.meter,
				phraseBeats: t.meter === 3 ? 24 : 32,
				introBeats: t.introBeats ?? 0,
				mimeType: 'audio/mpeg',
				fileSize: 1,
				sha256: String(i).padStart(64, '0'),
				storageKey: `audio/${String(i).padStart(64, '0')}.mp3`
			})
			.returning()
			.get()
	);
	const lantern = danceRows.find((d) => d.name === 'Marrowby Lantern Waltz')!;
	const keeper = trackRows.find((t) => t.title === 'The Lantern Keeper’s Waltz')!;
	db.insert(fits).values({ trackId: keeper.id, danceId: lantern.id, verdict: 'fits' }).run();
	seedEvenings(db, { ids, danceRows, trackRows });
	return { ids, danceRows, trackRows };
}
