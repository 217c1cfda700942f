// The points and bands the tempo-and-difficulty chart draws, and its summary in words. Pure.
import { LEVEL_LABELS, levelRank, type EntryKind, type Level } from '../../domain';

export interface ChartEntry {
	kind: EntryKind;
	name: string;
	startS: number;
	durationS: number;
	/** Effective tempo: track BPM × rate. */
	bpm: number | null;
	level: Level | null;
}

export interface ChartSection {
	title: string;
	kind: string;
	startS: number;
	endS: number;
}

export interface ChartPoint {
	/** Minutes from the evening's start, at the middle of the entry. */
	min: number;
	name: string;
	bpm: number | null;
	rank: number | null;
	level: string | null;
}

export function chartPoints(entries: readonly ChartEntry[]): ChartPoint[] {
	return entries
		.filter((e) => e.kind === 'dance')
		.map((e) => ({
			min: (e.startS + e.durationS / 2) / 60,
			name: e.name,
			bpm: e.bpm,
			rank: e.level ? levelRank(e.level) : null,
			level: e.level ? LEVEL_LABELS[e.level] : null
		}));
}

/** One or two sentences that say what the chart shows, for people who do not see it. */
export function chartSummary(points: readonly ChartPoint[], fastBpm = 150): string {
	const tempos = points.map((p) => p.bpm).filter((b): b is number => b != null);
	if (!points.length) return 'No dances in the run order yet.';
	const parts = [`${points.length} dances.`];
	if (tempos.length) {
		const fast = tempos.filter((t) => t >= fastBpm).length;
		parts.push(
			`Tempo from ${Math.round(Math.min(...tempos))} to ${Math.round(Math.max(...tempos))} BPM; ${fast} at ${fastBpm} BPM or faster.`
		);
	}
	const counts = new Map<string, number>();
	for (const p of points) if (p.level) counts.set(p.level, (counts.get(p.level) ?? 0) + 1);
	if (counts.size)
		parts.push(
			'Levels: ' +
				[...counts.entries()].map(([level, n]) => `${n} ${level.toLowerCase()}`).join(', ') +
				'.'
		);
	return parts.join(' ');
}
