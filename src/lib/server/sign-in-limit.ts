// Failed sign-ins are counted per (account, address) pair, per address and per account.
// A pair or an address past its limit is refused for the window; an account is never refused
// outright, only slowed, so a stranger failing on purpose cannot keep the owner out (issue 13,
// finding 2). Keys are built from the typed e-mail, so real and unknown accounts are treated
// alike. The figures are our own judgement (in the spirit of OWASP's authentication guidance,
// from memory): enough tries for a person who mistypes, too few for guessing.
import { and, eq, gte, lt, or } from 'drizzle-orm';
import { db } from './db';
import { signInFailures } from './db/schema';

export const WINDOW_MS = 15 * 60 * 1000;
/** Failures from one address at one account before that pair is refused. */
export const MAX_PER_PAIR = 5;
/** Failures from one address, across accounts, before the address is refused. */
export const MAX_PER_ADDRESS = 20;
/** Failures at one account, across addresses, before every try at it is slowed. */
export const SLOW_AFTER = 10;
export const DELAY_STEP_MS = 500;
export const MAX_DELAY_MS = 8000;

const account = (email: string) => email.trim().toLowerCase();
const keys = (email: string, address: string) => ({
	account: `email:${account(email)}`,
	address: `ip:${address}`,
	pair: `pair:${account(email)}|${address}`
});

function failuresSince(key: string, since: number) {
	return db()
		.select({ id: signInFailures.id })
		.from(signInFailures)
		.where(and(eq(signInFailures.key, key), gte(signInFailures.at, since)))
		.all().length;
}

export interface SignInGate {
	/** Refuse this try: this address has failed too often here or everywhere. */
	limited: boolean;
	/** Wait this long before checking the password: the account is under attack. */
	delayMs: number;
}

export function signInGate(email: string, address: string, now = Date.now()): SignInGate {
	const k = keys(email, address);
	const since = now - WINDOW_MS;
	const limited =
		failuresSince(k.pair, since) >= MAX_PER_PAIR ||
		failuresSince(k.address, since) >= MAX_PER_ADDRESS;
	const over = failuresSince(k.account, since) - SLOW_AFTER + 1;
	return { limited, delayMs: over > 0 ? Math.min(MAX_DELAY_MS, over * DELAY_STEP_MS) : 0 };
}

export const isLimited = (email: string, address: string, now = Date.now()) =>
	signInGate(email, address, now).limited;

export function recordFailure(email: string, address: string, now = Date.now()) {
	const k = keys(email, address);
	db()
		.insert(signInFailures)
		.values([
			{ key: k.account, at: now },
			{ key: k.address, at: now },
			{ key: k.pair, at: now }
		])
		.run();
	// Old rows are of no use; drop them as we go so the table stays small.
	db()
		.delete(signInFailures)
		.where(lt(signInFailures.at, now - WINDOW_MS))
		.run();
}

/** A good sign-in clears its own pair only: the attack on the account may still be going on. */
export function clearPair(email: string, address: string) {
	db()
		.delete(signInFailures)
		.where(eq(signInFailures.key, keys(email, address).pair))
		.run();
}

/** A new password (by reset) clears every count for the account. */
export function clearAccount(email: string) {
	const prefix = `pair:${account(email)}|`;
	db()
		.delete(signInFailures)
		.where(
			or(
				eq(signInFailures.key, keys(email, '').account),
				// Every pair key of this account: '}' sorts just after '|'.
				and(gte(signInFailures.key, prefix), lt(signInFailures.key, `pair:${account(email)}}`))
			)
		)
		.run();
}
