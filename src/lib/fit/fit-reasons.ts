// The words of one fit result, in reading order: the team's verdict, meter, tempo, phrasing,
// walls, ending, length. A ReasonMemo shares identical sentences across the tracks of one
// ranking (one dance, one settings object), which keeps a 10,000-track list light on memory.
import { minutesSeconds } from '../format';
import type { DanceFacts, Verdict } from '../domain';
import type { PhrasingDetail } from './phrasing';
import { bpmText, driftReason, plural, rateText, tempoReason, wallWords } from './reasons';
import type { FitSettings } from './settings';
import type { TempoFit } from './tempo-fit';

/** Sentences already written for one dance and one settings object, by the figure they depend on. */
export class ReasonMemo {
	readonly tempo = new Map<number, string>();
	readonly drift = new Map<number, string>();
	readonly repetitions = new Map<number, string>();
	readonly walls = new Map<number, string>();
	readonly stops = new Map<number, string>();
	readonly long = new Map<number, string>();
}

export interface FitFacts {
	verdict: Verdict | null;
	verdictRate: number | null;
	meterReason: string | null;
	tempo: TempoFit | null;
	/** True when the rate came from the team, so the tempo sentence is not shared. */
	fixedRate: boolean;
	range: Pick<DanceFacts, 'bpmMin' | 'bpmMax'>;
	phrasing: PhrasingDetail;
	/** Seconds the song lasts as played (duration ÷ rate). */
	playedS: number;
}

export function fitReasons(
	f: FitFacts,
	dance: DanceFacts,
	s: FitSettings,
	m: ReasonMemo | null
): string[] {
	const words: string[] = [];
	if (f.verdict === 'fits') words.push('the team marked it as fitting');
	if (f.verdict === 'fits-at-rate') {
		const at = f.verdictRate ? ` at ${rateText(f.verdictRate)}` : ' at a changed rate';
		words.push(`the team marked it as fitting${at}`);
	}
	if (f.verdict === 'does-not-fit') words.push('the team marked it as not fitting');
	if (f.meterReason) words.push(f.meterReason);

	// Shared sentences are looked up before they are written; no closures here, this runs for
	// every track of a ranking.
	const t = f.tempo;
	if (t) {
		let text = f.fixedRate ? undefined : m?.tempo.get(t.trackBpm);
		if (text === undefined) {
			text = tempoReason(t, f.range.bpmMin, f.range.bpmMax, s.maxRateChange);
			if (!f.fixedRate) m?.tempo.set(t.trackBpm, text);
		}
		words.push(text);
		// Halving 3/4 puts 1½ counts in a bar: it only works when the measured tempo was itself
		// a double (or half) reading. A 3/4 track truly at 180 BPM is Viennese waltz speed.
		if (t.relation !== 'direct' && dance.meter === 3) {
			const other = t.relation === 'half' ? 'double' : 'half';
			words.push(
				`in 3/4 this only works if ${bpmText(t.trackBpm)} BPM was measured at ${other} the real beat — check the track's tempo`
			);
		}
	} else {
		words.push('tempo not measured yet');
	}

	const p = f.phrasing;
	let drift = m?.drift.get(p.phraseCounts);
	if (drift === undefined) {
		const { driftCounts, realignAfterRepetitions, phraseCounts, hasEvents } = p;
		drift = driftReason(
			dance.counts,
			driftCounts,
			realignAfterRepetitions,
			phraseCounts,
			hasEvents
		);
		m?.drift.set(phraseCounts, drift);
	}
	words.push(drift);
	if (p.repetitions == null || p.secondsPerRepetition == null) return words;

	const reps = p.repetitions;
	const each = Math.round(p.secondsPerRepetition * 10) / 10;
	const repsKey = reps * 100_000 + each * 10;
	let repsText = m?.repetitions.get(repsKey);
	if (repsText === undefined) {
		repsText = `${plural(reps, 'whole repetition')}, ${each} s each`;
		m?.repetitions.set(repsKey, repsText);
	}
	words.push(repsText);

	const wall = p.endWall;
	if (dance.walls > 1 && wall != null) {
		let wallText = m?.walls.get(wall);
		if (wallText === undefined) {
			wallText = `ends on ${wallWords(wall, dance.walls, dance.turn)}`;
			m?.walls.set(wall, wallText);
		}
		words.push(wallText);
	}
	if (p.endsCleanly) words.push('the music ends with a repetition');
	else {
		const into = Math.round(p.intoRepetition ?? 0);
		let stops = m?.stops.get(into);
		if (stops === undefined) {
			stops = `the music stops ${into} counts into a repetition`;
			m?.stops.set(into, stops);
		}
		words.push(stops);
	}
	if (reps < s.minRepetitions) words.push(`too short for ${s.minRepetitions} repetitions`);
	else if (f.playedS > s.longSongS) {
		const played = Math.round(f.playedS);
		let long = m?.long.get(played);
		if (long === undefined) {
			long = `a long song as played (${minutesSeconds(played)})`;
			m?.long.set(played, long);
		}
		words.push(long);
	}
	return words;
}
