// An invented evening for the export tests: names, venue and songs are made up. It carries the
// awkward cases on purpose: commas, quotes and line breaks in text, a non-ASCII title long enough
// to fold, a slowed teach track, a break and an announcement.
import type { RunSheet } from '../share/sheet';

const start = Date.UTC(2026, 11, 11, 19, 0, 0); // 19:00 in London: GMT in December

export const SHEET: RunSheet = {
	id: 7,
	title: 'Thistlewick Barn Social – Café night, with a “quoted” word and a much longer tail',
	venue: 'Copperlane Hall, 3 Fenny Row; Upper Marrowby',
	startsAt: start,
	endsAt: start + 4 * 3600_000,
	crowd: 'mixed',
	notes: 'Soft-soled shoes, please.',
	published: true,
	shareUrl: 'https://floorset.example/e/AbCdEfGhIjKlMnOpQrStUvWx',
	timeZone: 'Europe/London',
	sections: [
		{
			kind: 'lesson',
			title: '',
			startsAt: start,
			endsAt: start + 30 * 60_000,
			danceName: 'Pebble Lane Stroll',
			teacherFirstName: 'Odile'
		},
		{
			kind: 'open-floor',
			title: 'Open floor',
			startsAt: start + 30 * 60_000,
			endsAt: start + 4 * 3600_000,
			danceName: null,
			teacherFirstName: null
		}
	],
	entries: [
		{
			position: 1,
			kind: 'teach',
			startsAt: start,
			durationS: 1200,
			danceId: 3,
			danceName: 'Pebble Lane Stroll',
			level: 'beginner',
			formation: 'line',
			trackId: 11,
			trackTitle: 'Hayloft Lanterns',
			artist: 'The Wrenhill Five',
			trackDurationS: 201.6,
			bpm: 120,
			rate: 0.9,
			locked: true,
			text: 'Walk it twice, then "with music"'
		},
		{
			position: 2,
			kind: 'dance',
			startsAt: start + 1200_000,
			durationS: 224,
			danceId: 3,
			danceName: 'Pebble Lane Stroll',
			level: 'beginner',
			formation: 'line',
			trackId: 11,
			trackTitle: 'Hayloft Lanterns',
			artist: 'The Wrenhill Five',
			trackDurationS: 201.6,
			bpm: 120,
			rate: 0.9,
			locked: false,
			text: ''
		},
		{
			position: 3,
			kind: 'dance',
			startsAt: start + 1424_000,
			durationS: 187.4,
			danceId: 5,
			danceName: 'Gorse, Gate & Gallop',
			level: 'intermediate',
			formation: 'partner',
			trackId: 12,
			trackTitle: 'Tin Roof, Rain',
			artist: 'Mabel Ashgrove',
			trackDurationS: 187.4,
			bpm: 168.25,
			rate: 1,
			locked: false,
			text: '=not a formula\nsecond line'
		},
		{
			position: 4,
			kind: 'break',
			startsAt: start + 1611_400,
			durationS: 600,
			danceId: null,
			danceName: null,
			level: null,
			formation: null,
			trackId: null,
			trackTitle: null,
			artist: null,
			trackDurationS: null,
			bpm: null,
			rate: 1,
			locked: false,
			text: 'Tea and water'
		},
		{
			position: 5,
			kind: 'announcement',
			startsAt: start + 2211_400,
			durationS: 60,
			danceId: null,
			danceName: null,
			level: null,
			formation: null,
			trackId: null,
			trackTitle: null,
			artist: null,
			trackDurationS: null,
			bpm: null,
			rate: 1,
			locked: false,
			text: 'Raffle, then the request block'
		}
	]
};
