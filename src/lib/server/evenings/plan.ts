// Planning an evening (a proposal, not saved) and planning-and-saving it (for the demo seed).
import { planEvening, type PlanResult } from '../../planner';
import type { EntryInput } from '../../schemas/evening';
import { db } from '../db';
import { evenings } from '../db/schema';
import { eq } from 'drizzle-orm';
import { EveningError } from './errors';
import { planInputFor } from './plan-input';
import { saveRunOrder, type SaveResult } from './run-order';

/** What the planner needs for the evening, read from the database (on the server's thread). */
export { planInputFor } from './plan-input';

/** The planner's proposal for the evening; `draft` is the editor's unsaved run order, if any. */
export function planFor(
	eveningId: number,
	seed?: number,
	draft?: { entries: readonly EntryInput[] }
): PlanResult {
	return planEvening(planInputFor(eveningId, seed, draft));
}

/** The proposal's entries in the shape a run-order save takes. */
export function entriesOf(result: PlanResult): EntryInput[] {
	return result.entries.map((e) => ({
		kind: e.kind,
		sectionId: typeof e.sectionId === 'number' ? e.sectionId : null,
		danceId: typeof e.danceId === 'number' ? e.danceId : null,
		trackId: typeof e.trackId === 'number' ? e.trackId : null,
		rate: e.rate,
		durationS: e.durationS,
		startS: e.startS,
		locked: e.locked,
		text: e.title ?? '',
		reasons: e.reasons
	}));
}

/**
 * Plans the evening around its locked entries and saves the result as its run order (used by
 * the demo seed). Returns the new run-order version and the plan.
 */
export function planAndSave(eveningId: number, seed = 1): SaveResult & { plan: PlanResult } {
	const row = db()
		.select({ version: evenings.runOrderVersion })
		.from(evenings)
		.where(eq(evenings.id, eveningId))
		.get();
	if (!row) throw new EveningError('There is no such evening.', 404);
	const plan = planFor(eveningId, seed);
	return { ...saveRunOrder(eveningId, row.version, entriesOf(plan)), plan };
}
