// A dance row as the API and the pages send it, and the other way: form or API fields to columns.
import type { DanceFacts, Formation, PhraseEvent } from '../../domain';
import type { DanceInput } from '../../schemas/dance';
import type { dances } from '../db/schema';

export type DanceRow = typeof dances.$inferSelect;

export interface DanceJson {
	id: number;
	name: string;
	counts: number;
	walls: 1 | 2 | 4;
	level: DanceRow['level'];
	rhythm: DanceFacts['rhythm'];
	meter: 3 | 4;
	bpmMin: number;
	bpmMax: number;
	turn: 'left' | 'right' | null;
	formation: Formation;
	tags: { repetition: number; afterCount: number; lengthCounts: number }[];
	restarts: { repetition: number; afterCount: number }[];
	notes: string;
	choreographer: string;
	wellKnown: boolean;
	version: number;
	stepSheetUrl: string | null;
	stepSheetName: string | null;
	updatedAt: string;
}

export const stepSheetUrl = (id: number) => `/api/dances/${id}/sheet`;

export function danceJson(row: DanceRow): DanceJson {
	const events = row.events ?? [];
	return {
		id: row.id,
		name: row.name,
		counts: row.counts,
		walls: row.walls as 1 | 2 | 4,
		level: row.level,
		rhythm: row.rhythm as DanceFacts['rhythm'],
		meter: row.meter as 3 | 4,
		bpmMin: row.bpmMin,
		bpmMax: row.bpmMax,
		turn: row.turn ?? null,
		formation: row.formation,
		tags: events
			.filter((e) => e.kind === 'tag')
			.map(({ repetition, afterCount, lengthCounts }) => ({
				repetition,
				afterCount,
				lengthCounts
			})),
		restarts: events
			.filter((e) => e.kind === 'restart')
			.map(({ repetition, afterCount }) => ({ repetition, afterCount })),
		notes: row.notes,
		choreographer: row.choreographer,
		wellKnown: row.wellKnown,
		version: row.version,
		stepSheetUrl: row.stepSheetKey ? stepSheetUrl(row.id) : null,
		stepSheetName: row.stepSheetKey ? (row.stepSheetName ?? 'step-sheet.pdf') : null,
		updatedAt: row.updatedAt.toISOString()
	};
}

/** Tags and restarts back into one list, in the order they happen. */
export function eventsOf(input: Pick<DanceInput, 'tags' | 'restarts'>): PhraseEvent[] {
	const events: PhraseEvent[] = [
		...input.tags.map((t) => ({ kind: 'tag' as const, ...t })),
		...input.restarts.map((r) => ({ kind: 'restart' as const, ...r, lengthCounts: 0 }))
	];
	return events.sort((a, b) => a.repetition - b.repetition || a.afterCount - b.afterCount);
}

/** Column values for an insert or update from validated fields. */
export function columnsOf(input: DanceInput) {
	const { tags, restarts, ...rest } = input;
	return { ...rest, events: eventsOf({ tags, restarts }) };
}

/** What the fit engine needs of a dance. */
export function danceFacts(row: DanceRow): DanceFacts {
	return {
		id: row.id,
		name: row.name,
		counts: row.counts,
		walls: row.walls as 1 | 2 | 4,
		level: row.level,
		rhythm: row.rhythm as DanceFacts['rhythm'],
		meter: row.meter as 3 | 4,
		bpmMin: row.bpmMin,
		bpmMax: row.bpmMax,
		turn: row.turn ?? null,
		events: row.events ?? []
	};
}
