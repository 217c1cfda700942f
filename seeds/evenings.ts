// The demo club's two evenings: a published social night and a draft beginners' evening.
// Their run orders are planned by the seed with the real planner when it is available.
import { randomBytes } from 'node:crypto';
import type { Db } from '../src/lib/server/db';
import { evenings, requests, sections } from '../src/lib/server/db/schema';
import type { SectionKind } from '../src/lib/domain';
import { CLUB } from './club';

interface Refs {
	ids: Record<string, number>;
	danceRows: { id: number; name: string }[];
	trackRows: { id: number; title: string }[];
}

type SectionSpec = [SectionKind, string, string, string, string?];

const at = (day: string, hm: string) => new Date(`${day}T${hm}:00Z`);

function addEvening(
	db: Db,
	refs: Refs,
	spec: {
		title: string;
		day: string;
		start: string;
		end: string;
		crowd: 'mostly-beginners' | 'mixed' | 'experienced';
		published: boolean;
		notes: string;
		sections: SectionSpec[];
	}
) {
	const evening = db
		.insert(evenings)
		.values({
			title: spec.title,
			venue: CLUB.venue,
			startsAt: at(spec.day, spec.start),
			endsAt: at(spec.day, spec.end),
			crowd: spec.crowd,
			notes: spec.notes,
			status: spec.published ? 'published' : 'draft',
			shareToken: spec.published ? randomBytes(16).toString('base64url') : null,
			createdBy: refs.ids['organiser@floorset.test']
		})
		.returning()
		.get();
	spec.sections.forEach(([kind, title, from, to, danceName], position) => {
		db.insert(sections)
			.values({
				eveningId: evening.id,
				position,
				kind,
				title,
				startsAt: at(spec.day, from),
				endsAt: at(spec.day, to),
				danceId: danceName ? refs.danceRows.find((d) => d.name === danceName)!.id : null,
				teacherId: kind === 'lesson' ? refs.ids['instructor@floorset.test'] : null
			})
			.run();
	});
	return evening;
}

export function seedEvenings(db: Db, refs: Refs) {
	const social = addEvening(db, refs, {
		title: 'Lantern Night Social',
		day: '2026-12-11',
		start: '19:00',
		end: '23:00',
		crowd: 'mixed',
		published: true,
		notes: 'Mince pies at the break. Smooth-soled shoes, please: the hall floor is sprung wood.',
		sections: [
			['lesson', 'Lesson: Marrowby Lantern Waltz', '19:00', '19:40', 'Marrowby Lantern Waltz'],
			['open-floor', 'Open floor', '19:40', '20:50'],
			['break', 'Tea break', '20:50', '21:05'],
			['request-block', 'Your requests', '21:05', '21:50'],
			['open-floor', 'Open floor', '21:50', '22:50'],
			['last-dance', 'Last dance', '22:50', '23:00']
		]
	});
	addEvening(db, refs, {
		title: 'New Year Beginners’ Evening',
		day: '2027-01-08',
		start: '19:30',
		end: '22:00',
		crowd: 'mostly-beginners',
		published: false,
		notes: 'First night for the January course. Keep it gentle.',
		sections: [
			['lesson', 'Lesson: Brackenfold Stroll', '19:30', '20:10', 'Brackenfold Stroll'],
			['open-floor', 'Open floor', '20:10', '21:10'],
			['break', 'Break', '21:10', '21:25'],
			['open-floor', 'Open floor', '21:25', '21:52'],
			['last-dance', 'Last dance', '21:52', '22:00']
		]
	});
	db.insert(requests)
		.values({
			eveningId: social.id,
			kind: 'dance',
			danceId: refs.danceRows.find((d) => d.name === 'Saltmarsh Swing')!.id,
			requesterId: refs.ids['dancer@floorset.test'],
			requesterName: 'Sam Quillon',
			message: 'My favourite!'
		})
		.run();
}
