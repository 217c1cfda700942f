// The changeover between entries: the evening's planner setting, else the planner's default.
import { DEFAULT_SETTINGS } from '../../planner/settings';
import type { PlanSettingsInput } from '../../schemas/evening';

export const gapSeconds = (planSettings: PlanSettingsInput): number =>
	planSettings.settings?.gapS ?? DEFAULT_SETTINGS.gapS;
