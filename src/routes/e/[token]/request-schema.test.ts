import { describe, expect, test } from 'vitest';
import { requestSchema } from './request-schema';

describe('the public request form', () => {
	test('a dance from the list, or a typed name, is enough; text is trimmed', () => {
		expect(requestSchema.parse({ danceId: '9' })).toMatchObject({ danceId: 9, danceName: '' });
		expect(requestSchema.parse({ danceName: '  Off-List Reel ' })).toMatchObject({
			danceId: undefined,
			danceName: 'Off-List Reel',
			message: '',
			name: '',
			website: ''
		});
	});

	test('refuses a request that names no dance, and ids that are not numbers', () => {
		const none = requestSchema.safeParse({ danceId: '', danceName: '   ', message: 'hi' });
		expect(none.success).toBe(false);
		expect(none.error?.issues[0].path).toEqual(['danceName']);
		expect(requestSchema.safeParse({ danceId: '1; DROP TABLE' }).success).toBe(false);
		expect(requestSchema.safeParse({ danceId: '12345678901' }).success).toBe(false);
	});

	test('every field is length-limited', () => {
		expect(requestSchema.safeParse({ danceName: 'x'.repeat(81) }).success).toBe(false);
		expect(requestSchema.safeParse({ danceId: '1', message: 'x'.repeat(281) }).success).toBe(false);
		expect(requestSchema.safeParse({ danceId: '1', name: 'x'.repeat(41) }).success).toBe(false);
		expect(requestSchema.safeParse({ danceId: '1', website: 'x'.repeat(201) }).success).toBe(false);
		expect(requestSchema.safeParse({ danceId: '1', message: 'x'.repeat(280) }).success).toBe(true);
	});

	test('the trap field comes through, so the action can tell a bot', () => {
		expect(requestSchema.parse({ danceId: '1', website: 'http://spam.example' }).website).toBe(
			'http://spam.example'
		);
	});
});
