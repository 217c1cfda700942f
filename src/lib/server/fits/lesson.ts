// Music for a lesson of one dance for a crowd level: the target tempo, the fitting tracks that
// are already slow enough (slowest first), and for each fitting track the playback rate that
// reaches the target or why it is refused. The numbers come from the fit engine's lesson tempo.
import type { Level, TrackFacts } from '../../domain';
import {
	DEFAULT_LESSON_SETTINGS,
	lessonRate,
	lessonTarget,
	lessonTracks,
	type LessonTarget
} from '../../fit';
import type { DanceFits } from './ranking';
import { fitSettings, lessonSettings } from './settings';

export const SLOW_ENOUGH_SHOWN = 20;
export const SLOWED_SHOWN = 20;

export interface SlowEnough {
	track: TrackFacts;
	effectiveBpm: number | null;
	verdict: string | null;
	reasons: string[];
	phrasing: DanceFits['items'][number]['phrasing'];
}

export interface Slowed {
	track: TrackFacts;
	verdict: string | null;
	ok: boolean;
	rate: number | null;
	reason: string;
}

export interface LessonMusic {
	target: LessonTarget;
	slowEnough: SlowEnough[];
	slowed: Slowed[];
	/** The bounds used, so the page can say where a refusal comes from. */
	minRate: number;
	maxRate: number;
}

export function lessonMusic(fits: DanceFits, level: Level): LessonMusic {
	const settings = lessonSettings();
	const target = lessonTarget(fits.facts, level, settings);
	const slow = lessonTracks(fits.facts, fits.tracks, level, fits.verdicts, settings, fitSettings());
	const byId = new Map(fits.tracks.map((t) => [t.id, t]));
	const fitting = fits.items.filter((i) => i.fitting);
	return {
		target,
		slowEnough: slow.slice(0, SLOW_ENOUGH_SHOWN).map((item) => ({
			track: byId.get(item.trackId)!,
			effectiveBpm: item.tempo.effectiveBpm,
			verdict: item.verdict,
			reasons: item.reasons,
			phrasing: item.phrasing
		})),
		slowed: fitting.slice(0, SLOWED_SHOWN).map((item) => {
			const r = lessonRate(item.track, fits.facts, level, settings);
			return { track: item.track, verdict: item.verdict, ok: r.ok, rate: r.rate, reason: r.reason };
		}),
		minRate: settings?.minLessonRate ?? DEFAULT_LESSON_SETTINGS.minLessonRate,
		maxRate: settings?.maxLessonRate ?? DEFAULT_LESSON_SETTINGS.maxLessonRate
	};
}
