import { expect, test } from 'vitest';
import { minutesSeconds } from './format';

test('minutes:seconds rounds to the whole second before splitting', () => {
	expect(minutesSeconds(215.4)).toBe('3:35');
	// 59.6 s is "1:00", never "0:60".
	expect(minutesSeconds(59.6)).toBe('1:00');
	expect(minutesSeconds(0)).toBe('0:00');
	expect(minutesSeconds(-3)).toBe('0:00');
	expect(minutesSeconds(3600)).toBe('60:00');
});
