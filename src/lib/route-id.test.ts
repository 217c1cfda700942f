import { expect, test } from 'vitest';
import { match } from '../params/id';
import { idParam } from './route-id';

test('an id in a URL is a positive whole number the app could have made', () => {
	for (const [text, id] of [
		['1', 1],
		['42', 42],
		['999999999999999', 999_999_999_999_999]
	] as const) {
		expect(match(text)).toBe(true);
		expect(idParam(text)).toBe(id);
	}
	// Refused by the route matcher, so the URL matches no route (404): no number games.
	for (const text of ['0', '-1', '007', '1e3', '1.5', ' 1', 'abc', '', '9007199254740993']) {
		expect(match(text), text).toBe(false);
		expect(idParam(text), text).toBeNull();
	}
});
