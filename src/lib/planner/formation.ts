// Line, partner and circle dances across the night: the one place the rule and the balance are
// written, read by the objective, the greedy's look-ahead and the hard-rule report alike.
// A country night alternates line dances with partner dances so couples get the floor and
// nobody waits long for either (common practice, no source); the spacing is the evening's.
import type { PlanSettings } from './types';

/** Two partner dances back to back, when the evening's setting has not asked for it. */
export const partnerTwice = (s: PlanSettings, prevPartner: boolean, partner: boolean) =>
	partner && prevPartner && !s.partnerBackToBack;

/**
 * Soft cost of a dance by how long since the last partner dance (`since` dances), against
 * "one partner dance after every N line dances". Off (0) or with no partner dance to play,
 * nothing is asked.
 */
export function formationCost(
	s: PlanSettings,
	havePartner: boolean,
	since: number,
	partner: boolean
): number {
	const every = s.partnerEvery;
	if (every <= 0 || !havePartner) return 0;
	// Early is mildly off (the line dancers lose a turn); late grows with every dance over.
	if (partner) return since < every ? (every - since) / every : 0;
	return since >= every ? 0.5 + 0.25 * (since - every) : 0;
}

/** The evening-form setting in its own words, for reasons and warnings. */
export const partnerSettingWords = (s: PlanSettings) =>
	`the evening's setting "a partner dance after every ${s.partnerEvery} line dances"`;
