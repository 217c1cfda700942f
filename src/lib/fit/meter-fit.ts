// Meter: a dance in 3/4 needs music in 3/4 and a 4/4 dance needs 4/4 (DESIGN.md, "Fit score":
// a waltz needs 3/4). Duple 2/4 music is stored as 4/4, so it pairs with 4/4 dances.
import type { Meter } from '../domain';

export interface MeterFit {
	ok: boolean;
	/** Plain words, only when the meters differ: "3/4 music for a 4/4 dance". */
	reason: string | null;
}

export function fitMeter(trackMeter: Meter, danceMeter: Meter): MeterFit {
	if (trackMeter === danceMeter) return { ok: true, reason: null };
	return { ok: false, reason: `${trackMeter}/4 music for a ${danceMeter}/4 dance` };
}
