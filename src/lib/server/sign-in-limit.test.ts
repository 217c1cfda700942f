import { afterEach, beforeEach, expect, test } from 'vitest';
import {
	clearAccount,
	clearPair,
	DELAY_STEP_MS,
	isLimited,
	MAX_DELAY_MS,
	MAX_PER_ADDRESS,
	MAX_PER_PAIR,
	recordFailure,
	signInGate,
	SLOW_AFTER,
	WINDOW_MS
} from './sign-in-limit';
import { makeTestDb } from './testing/test-db';

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

const now = 1_800_000_000_000;
const open = { limited: false, delayMs: 0 };

test('five failures from one address do not keep the owner out from another (issue 13, 2)', () => {
	for (let i = 0; i < MAX_PER_PAIR; i++) recordFailure('DJ@floorset.test', '127.0.0.2', now);
	// The attacked address stays refused for the window …
	expect(signInGate('dj@floorset.test', '127.0.0.2', now + 1).limited).toBe(true);
	expect(isLimited('dj@floorset.test', '127.0.0.2', now + WINDOW_MS + 1)).toBe(false);
	// … while the owner, elsewhere, is let through at once.
	expect(signInGate('dj@floorset.test', '127.0.0.3', now + 1)).toEqual(open);
	expect(signInGate('organiser@floorset.test', '127.0.0.2', now + 1)).toEqual(open);
});

test('an account failed at from many addresses is slowed, more and more, but never refused', () => {
	for (let i = 0; i < SLOW_AFTER - 1; i++) recordFailure('dj@floorset.test', `10.0.0.${i}`, now);
	expect(signInGate('dj@floorset.test', '10.9.9.9', now + 1)).toEqual(open);
	recordFailure('dj@floorset.test', '10.0.1.1', now);
	expect(signInGate('dj@floorset.test', '10.9.9.9', now + 1)).toEqual({
		limited: false,
		delayMs: DELAY_STEP_MS
	});
	recordFailure('dj@floorset.test', '10.0.1.2', now);
	expect(signInGate('dj@floorset.test', '10.9.9.9', now + 1).delayMs).toBe(2 * DELAY_STEP_MS);
	for (let i = 0; i < 100; i++) recordFailure('dj@floorset.test', `10.0.2.${i}`, now);
	expect(signInGate('dj@floorset.test', '10.9.9.9', now + 1)).toEqual({
		limited: false,
		delayMs: MAX_DELAY_MS
	});
});

test('a real and an unknown account get the same answer for the same failures', () => {
	// The limiter never looks the account up: its keys come from the typed e-mail alone.
	for (const email of ['organiser@floorset.test', 'nobody-here@floorset.test']) {
		for (let i = 0; i < MAX_PER_PAIR; i++) recordFailure(email, '127.0.0.2', now);
		for (let i = 0; i < SLOW_AFTER; i++) recordFailure(email, `10.1.0.${i}`, now);
	}
	const gates = ['organiser@floorset.test', 'nobody-here@floorset.test'].flatMap((email) => [
		signInGate(email, '127.0.0.2', now + 1),
		signInGate(email, '127.0.0.3', now + 1)
	]);
	expect(gates[0]).toEqual({ limited: true, delayMs: expect.any(Number) });
	expect(gates[1].limited).toBe(false);
	expect(gates.slice(2)).toEqual(gates.slice(0, 2));
});

test('an address is refused after failures across many accounts', () => {
	for (let i = 0; i < MAX_PER_ADDRESS; i++) recordFailure(`p${i}@floorset.test`, '192.0.2.7', now);
	expect(isLimited('someone-new@floorset.test', '192.0.2.7', now + 1)).toBe(true);
	expect(isLimited('someone-new@floorset.test', '192.0.2.8', now + 1)).toBe(false);
});

test('a good sign-in clears its own pair only; a reset clears the whole account', () => {
	for (let i = 0; i < MAX_PER_PAIR; i++) recordFailure('dj@floorset.test', '192.0.2.1', now);
	for (let i = 0; i < MAX_PER_PAIR; i++) recordFailure('dj@floorset.test', '192.0.2.2', now);
	clearPair('dj@floorset.test', '192.0.2.1');
	expect(isLimited('dj@floorset.test', '192.0.2.1', now + 1)).toBe(false);
	expect(isLimited('dj@floorset.test', '192.0.2.2', now + 1)).toBe(true);
	clearAccount('DJ@floorset.test');
	expect(signInGate('dj@floorset.test', '192.0.2.2', now + 1)).toEqual(open);
});

test('one failure fewer than the limit still lets a person in', () => {
	for (let i = 0; i < MAX_PER_PAIR - 1; i++) recordFailure('dj@floorset.test', '192.0.2.1', now);
	expect(isLimited('dj@floorset.test', '192.0.2.1', now + 1)).toBe(false);
});
