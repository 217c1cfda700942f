// The team's fit and lesson settings, kept in the settings table under 'fit' and 'lesson'.
// Missing or malformed values fall back to the fit engine's defaults (its file names the sources).
import { eq } from 'drizzle-orm';
import type { FitSettings, LessonSettingsInput } from '../../fit';
import { db } from '../db';
import { settings } from '../db/schema';

function read(key: string): Record<string, unknown> | null {
	const row = db()
		.select({ value: settings.value })
		.from(settings)
		.where(eq(settings.key, key))
		.get();
	const value = row?.value;
	return value && typeof value === 'object' && !Array.isArray(value)
		? (value as Record<string, unknown>)
		: null;
}

export const fitSettings = (): Partial<FitSettings> | null =>
	read('fit') as Partial<FitSettings> | null;

export const lessonSettings = (): LessonSettingsInput | null =>
	read('lesson') as LessonSettingsInput | null;
