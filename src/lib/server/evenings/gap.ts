// The changeover between entries: the evening's planner setting, else the planner's default.
import { DEFAULT_SETTINGS } from '../../planner/settings';

export function gapSeconds(planSettings: Record<string, unknown>): number {
	const settings = planSettings.settings as { gapS?: unknown } | undefined;
	const gap = settings?.gapS;
	return typeof gap === 'number' && Number.isFinite(gap) && gap >= 0 ? gap : DEFAULT_SETTINGS.gapS;
}
