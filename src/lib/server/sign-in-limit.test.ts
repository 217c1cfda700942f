import { afterEach, beforeEach, expect, test } from 'vitest';
import {
	clearAccount,
	isLimited,
	MAX_PER_ACCOUNT,
	MAX_PER_ADDRESS,
	recordFailure,
	WINDOW_MS
} from './sign-in-limit';
import { makeTestDb } from './testing/test-db';

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

const now = 1_800_000_000_000;

test('an account is limited after its failures, from any address, until the window passes', () => {
	for (let i = 0; i < MAX_PER_ACCOUNT; i++) recordFailure('DJ@floorset.test', `10.0.0.${i}`, now);
	expect(isLimited('dj@floorset.test', '10.9.9.9', now + 1)).toBe(true);
	expect(isLimited('dj@floorset.test', '10.9.9.9', now + WINDOW_MS + 1)).toBe(false);
	expect(isLimited('organiser@floorset.test', '10.9.9.9', now + 1)).toBe(false);
});

test('an address is limited after failures across many accounts', () => {
	for (let i = 0; i < MAX_PER_ADDRESS; i++) recordFailure(`p${i}@floorset.test`, '192.0.2.7', now);
	expect(isLimited('someone-new@floorset.test', '192.0.2.7', now + 1)).toBe(true);
	expect(isLimited('someone-new@floorset.test', '192.0.2.8', now + 1)).toBe(false);
});

test('a successful sign-in clears the account but not the address', () => {
	for (let i = 0; i < MAX_PER_ACCOUNT; i++) recordFailure('dj@floorset.test', '192.0.2.1', now);
	clearAccount('dj@floorset.test');
	expect(isLimited('dj@floorset.test', '192.0.2.99', now + 1)).toBe(false);
});

test('one failure fewer than the limit still lets a person in', () => {
	for (let i = 0; i < MAX_PER_ACCOUNT - 1; i++) recordFailure('dj@floorset.test', '192.0.2.1', now);
	expect(isLimited('dj@floorset.test', '192.0.2.1', now + 1)).toBe(false);
});
