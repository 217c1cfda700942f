// Invented tracks and dances for the fit engine's tests (no real titles, songs or artists).
import type { DanceFacts, TrackFacts } from '../domain';

export function track(over: Partial<TrackFacts> = {}): TrackFacts {
	return {
		id: 1,
		title: 'Lantern Road',
		artist: 'The Quiet Hollows',
		durationS: 180,
		bpm: 120,
		offsetS: 0,
		meter: 4,
		phraseBeats: 32,
		introBeats: 0,
		...over
	};
}

export function dance(over: Partial<DanceFacts> = {}): DanceFacts {
	return {
		id: 1,
		name: 'Copper Kettle Stomp',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'two-step',
		meter: 4,
		bpmMin: 116,
		bpmMax: 124,
		turn: 'left',
		events: [],
		...over
	};
}
