// The evening form: wall-clock date and times in the club's zone ↔ stored instants. Times before
// the evening's start are read as after midnight (an evening 19:30–00:30 ends the next day).
import { and, asc, eq, inArray } from 'drizzle-orm';
import { DEFAULT_SETTINGS } from '../../planner/settings';
import type { EveningCreate } from '../../schemas/evening';
import { eveningForm, type EveningFormInput } from '../../schemas/evening';
import { db } from '../db';
import { dances, userRoles, users } from '../db/schema';
import type { EveningJson } from './load';
import { timeProblem } from './section-rules';
import { clubTimeZone, fromWall, toWall } from './timezone';

export interface SectionValues {
	id?: number;
	kind: string;
	title: string;
	start: string;
	end: string;
	danceId?: number;
	teacherId?: number;
}

export interface EveningValues {
	title: string;
	venue: string;
	date: string;
	start: string;
	end: string;
	crowd: string;
	notes: string;
	sections: SectionValues[];
	mustPlay: number[];
	neverPlay: number[];
	/** "A rest after every N minutes of dancing": minutes, or '' for off (the default). */
	restEveryMin: string;
	/** "A partner dance after every N line dances": '0' (off) to '12'. */
	partnerEvery: string;
	partnerBackToBack: boolean;
}

const DAY_MS = 86_400_000;

function nextDay(date: string): string {
	const [y, m, d] = date.split('-').map(Number);
	return new Date(Date.UTC(y, m - 1, d) + DAY_MS).toISOString().slice(0, 10);
}

/** The instant of `time` on the evening: on its date, or the next day when earlier than `start`. */
function instant(date: string, start: string, time: string, tz: string): number | null {
	return fromWall(time < start ? nextDay(date) : date, time, tz);
}

const str = (form: FormData, key: string) => String(form.get(key) ?? '');
const nums = (form: FormData, key: string) =>
	form
		.getAll(key)
		.map(String)
		.filter((v) => v !== '');

/** Reads the posted form into values (to show again) and, when valid, the evening to store. */
export function readEveningForm(
	form: FormData
):
	| { ok: true; values: EveningValues; input: EveningCreate }
	| { ok: false; values: EveningValues; message: string } {
	const kinds = form.getAll('section-kind').map(String);
	const at = (key: string, i: number) => String(form.getAll(key)[i] ?? '');
	const sections: SectionValues[] = kinds.map((kind, i) => ({
		id: Number(at('section-id', i)) || undefined,
		kind,
		title: at('section-title', i),
		start: at('section-start', i),
		end: at('section-end', i),
		danceId: Number(at('section-dance', i)) || undefined,
		teacherId: Number(at('section-teacher', i)) || undefined
	}));
	const values: EveningValues = {
		title: str(form, 'title'),
		venue: str(form, 'venue'),
		date: str(form, 'date'),
		start: str(form, 'start'),
		end: str(form, 'end'),
		crowd: str(form, 'crowd'),
		notes: str(form, 'notes'),
		sections,
		mustPlay: nums(form, 'mustPlay').map(Number),
		neverPlay: nums(form, 'neverPlay').map(Number),
		restEveryMin: str(form, 'restEveryMin').trim(),
		partnerEvery: str(form, 'partnerEvery').trim() || String(DEFAULT_SETTINGS.partnerEvery),
		partnerBackToBack: form.get('partnerBackToBack') === 'on'
	};
	const parsed = eveningForm.safeParse(values);
	if (!parsed.success) {
		const issue = parsed.error.issues[0];
		const where =
			issue?.path[0] === 'sections' && typeof issue.path[1] === 'number'
				? `Section ${issue.path[1] + 1}: `
				: '';
		return { ok: false, values, message: `${where}${issue?.message ?? 'Check the form.'}` };
	}
	const v: EveningFormInput = parsed.data;
	const tz = clubTimeZone();
	const startsAt = fromWall(v.date, v.start, tz);
	const endsAt = instant(v.date, v.start, v.end, tz);
	if (startsAt === null || endsAt === null)
		return { ok: false, values, message: 'The date or a time is not valid.' };
	const list = v.sections.map((s) => ({
		id: s.id,
		kind: s.kind,
		title: s.title,
		startsAt: instant(v.date, v.start, s.start, tz) ?? NaN,
		endsAt: instant(v.date, v.start, s.end, tz) ?? NaN,
		danceId: s.kind === 'lesson' ? (s.danceId ?? null) : null,
		teacherId: s.kind === 'lesson' ? (s.teacherId ?? null) : null
	}));
	const problem = timeProblem(startsAt, endsAt, list);
	if (problem) return { ok: false, values, message: problem };
	return {
		ok: true,
		values,
		input: {
			title: v.title,
			venue: v.venue,
			startsAt,
			endsAt,
			crowd: v.crowd,
			notes: v.notes,
			sections: list,
			planSettings: {
				mustPlay: v.mustPlay,
				neverPlay: { danceIds: v.neverPlay },
				// 0 is the planner's "off": rests only where the sections put them.
				settings: {
					breakEveryMin: v.restEveryMin === '' ? 0 : v.restEveryMin,
					partnerEvery: v.partnerEvery,
					partnerBackToBack: v.partnerBackToBack
				}
			}
		}
	};
}

/** The form's values for an existing evening, in the club's zone. */
export function valuesOf(e: EveningJson): EveningValues {
	const tz = e.timeZone;
	const wall = (iso: string) => toWall(Date.parse(iso), tz);
	const ps = e.planSettings;
	const rest = ps.settings?.breakEveryMin ?? 0;
	return {
		title: e.title,
		venue: e.venue,
		date: wall(e.startsAt).date,
		start: wall(e.startsAt).time,
		end: wall(e.endsAt).time,
		crowd: e.crowd,
		notes: e.notes,
		sections: e.sections.map((s) => ({
			id: s.id,
			kind: s.kind,
			title: s.title,
			start: wall(s.startsAt).time,
			end: wall(s.endsAt).time,
			danceId: s.danceId ?? undefined,
			teacherId: s.teacherId ?? undefined
		})),
		mustPlay: (ps.mustPlay ?? []).map((m) => (typeof m === 'number' ? m : m.danceId)),
		neverPlay: ps.neverPlay?.danceIds ?? [],
		restEveryMin: rest > 0 ? String(rest) : '',
		partnerEvery: String(ps.settings?.partnerEvery ?? DEFAULT_SETTINGS.partnerEvery),
		partnerBackToBack: ps.settings?.partnerBackToBack === true
	};
}

/** A new evening's starting point: a typical social night's outline, to adjust. */
export function blankValues(): EveningValues {
	const date = toWall(Date.now() + 7 * DAY_MS, clubTimeZone()).date;
	const s = (kind: string, title: string, start: string, end: string): SectionValues => ({
		kind,
		title,
		start,
		end
	});
	return {
		title: '',
		venue: '',
		date,
		start: '19:30',
		end: '23:00',
		crowd: 'mixed',
		notes: '',
		sections: [
			s('lesson', 'Lesson', '19:30', '20:10'),
			s('open-floor', 'Open floor', '20:10', '21:15'),
			s('break', 'Break', '21:15', '21:30'),
			s('request-block', 'Requests', '21:30', '22:15'),
			s('open-floor', 'Open floor', '22:15', '22:50'),
			s('last-dance', 'Last dance', '22:50', '23:00')
		],
		mustPlay: [],
		neverPlay: [],
		restEveryMin: '',
		partnerEvery: String(DEFAULT_SETTINGS.partnerEvery),
		partnerBackToBack: false
	};
}

/** Dances and teachers the form offers. */
export function formChoices() {
	return {
		dances: db()
			.select({
				id: dances.id,
				name: dances.name,
				level: dances.level,
				rhythm: dances.rhythm,
				formation: dances.formation
			})
			.from(dances)
			.orderBy(asc(dances.name))
			.all(),
		teachers: db()
			.selectDistinct({ id: users.id, name: users.name })
			.from(users)
			.innerJoin(userRoles, eq(userRoles.userId, users.id))
			.where(and(inArray(userRoles.role, ['instructor'])))
			.orderBy(asc(users.name))
			.all()
	};
}
