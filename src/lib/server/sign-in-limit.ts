// Failed sign-ins are limited per account and per address. The figures are our own
// judgement (in the spirit of OWASP's authentication guidance, from memory): enough tries
// for a person who mistypes, too few for guessing.
import { and, eq, gte, lt } from 'drizzle-orm';
import { db } from './db';
import { signInFailures } from './db/schema';

export const WINDOW_MS = 15 * 60 * 1000;
export const MAX_PER_ACCOUNT = 5;
export const MAX_PER_ADDRESS = 20;

const keys = (email: string, address: string) => ({
	account: `email:${email.trim().toLowerCase()}`,
	address: `ip:${address}`
});

function failuresSince(key: string, since: number) {
	return db()
		.select({ id: signInFailures.id })
		.from(signInFailures)
		.where(and(eq(signInFailures.key, key), gte(signInFailures.at, since)))
		.all().length;
}

export function isLimited(email: string, address: string, now = Date.now()): boolean {
	const k = keys(email, address);
	const since = now - WINDOW_MS;
	return (
		failuresSince(k.account, since) >= MAX_PER_ACCOUNT ||
		failuresSince(k.address, since) >= MAX_PER_ADDRESS
	);
}

export function recordFailure(email: string, address: string, now = Date.now()) {
	const k = keys(email, address);
	db()
		.insert(signInFailures)
		.values([
			{ key: k.account, at: now },
			{ key: k.address, at: now }
		])
		.run();
	// Old rows are of no use; drop them as we go so the table stays small.
	db()
		.delete(signInFailures)
		.where(lt(signInFailures.at, now - WINDOW_MS))
		.run();
}

export function clearAccount(email: string) {
	db()
		.delete(signInFailures)
		.where(eq(signInFailures.key, keys(email, '').account))
		.run();
}
