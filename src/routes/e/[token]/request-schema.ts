import { z } from 'zod';

const text = (max: number, message: string) => z.string().trim().max(max, message).default('');

/** The public request form. Every field is length-limited; `website` is the bots' trap. */
export const requestSchema = z
	.object({
		danceId: z
			.string()
			.trim()
			.regex(/^\d{0,9}$/, 'Choose a dance from the list.')
			.default('')
			.transform((v) => (v ? Number(v) : undefined)),
		danceName: text(80, 'Keep the dance name under 80 characters.'),
		message: text(280, 'Keep the note under 280 characters.'),
		name: text(40, 'Keep your name under 40 characters.'),
		website: z.string().max(200).default('')
	})
	.refine((v) => v.danceId !== undefined || v.danceName.length > 0, {
		message: 'Choose a dance from the list or type its name.',
		path: ['danceName']
	});

export type RequestValues = Record<'danceId' | 'danceName' | 'message' | 'name', string>;
