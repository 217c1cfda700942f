import { z } from 'zod';

import { blockText, lineText } from '$lib/schemas/text';

/** The public request form. Every field is length-limited; `website` is the bots' trap. */
export const requestSchema = z
	.object({
		danceId: z
			.string()
			.trim()
			.regex(/^\d{0,9}$/, 'Choose a dance from the list.')
			.default('')
			.transform((v) => (v ? Number(v) : undefined)),
		danceName: lineText(80, 'dance name').default(''),
		message: blockText(280, 'note').trim().default(''),
		name: lineText(40, 'name').default(''),
		website: z.string().max(200).default('')
	})
	.refine((v) => v.danceId !== undefined || v.danceName.length > 0, {
		message: 'Choose a dance from the list or type its name.',
		path: ['danceName']
	});

export type RequestValues = Record<'danceId' | 'danceName' | 'message' | 'name', string>;
