// Invented rows for the dances and fits integration tests (never the demo's names).
import { createHash } from 'node:crypto';
import type { Db } from '../db';
import { tracks, users } from '../db/schema';
import type { DanceInput } from '../../schemas/dance';

export const aDance = (over: Partial<DanceInput> = {}): DanceInput => ({
	name: 'Pebbleford Ramble',
	counts: 32,
	walls: 4,
	level: 'beginner',
	rhythm: 'shuffle',
	meter: 4,
	bpmMin: 110,
	bpmMax: 126,
	turn: 'left',
	formation: 'line',
	tags: [],
	restarts: [],
	notes: '',
	choreographer: '',
	wellKnown: false,
	...over
});

export function aUser(db: Db, email = 'tester@floorset.test'): number {
	return db.insert(users).values({ email, name: 'Tess Ter' }).returning().get().id;
}

let n = 0;
export function aTrack(
	db: Db,
	over: Partial<typeof tracks.$inferInsert> = {}
): typeof tracks.$inferSelect {
	n++;
	const sha = createHash('sha256').update(`track-${n}-${Math.random()}`).digest('hex');
	return db
		.insert(tracks)
		.values({
			title: `Invented Tune ${n}`,
			artist: 'The Made-Up Band',
			durationS: 200,
			bpm: 120,
			meter: 4,
			phraseBeats: 32,
			mimeType: 'audio/mpeg',
			fileSize: 1000,
			sha256: sha,
			storageKey: `audio/${sha}.mp3`,
			...over
		})
		.returning()
		.get();
}
