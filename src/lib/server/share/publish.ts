// Publishing an evening: a random share token makes the public page /e/<token>; unpublishing
// clears it, so the old link answers 404. Publishing twice keeps the link people already have.
import { and, eq } from 'drizzle-orm';
import { randomBytes } from 'node:crypto';
import { db } from '../db';
import { evenings } from '../db/schema';

/** 18 random bytes: 144 bits, far past guessing; base64url keeps it URL-safe (24 characters). */
export const newShareToken = () => randomBytes(18).toString('base64url');

/** What a token may look like; anything else is not looked up at all. */
export const TOKEN_SHAPE = /^[A-Za-z0-9_-]{16,64}$/;

/** Publishes the evening; its share token, or null when there is no such evening. */
export function publishEvening(id: number): string | null {
	return db().transaction((tx) => {
		const row = tx
			.select({ token: evenings.shareToken })
			.from(evenings)
			.where(eq(evenings.id, id))
			.get();
		if (!row) return null;
		const token = row.token ?? newShareToken();
		tx.update(evenings)
			.set({ status: 'published', shareToken: token, updatedAt: new Date() })
			.where(eq(evenings.id, id))
			.run();
		return token;
	});
}

/** Back to draft, the token gone. False when there is no such evening. */
export function unpublishEvening(id: number): boolean {
	const result = db()
		.update(evenings)
		.set({ status: 'draft', shareToken: null, updatedAt: new Date() })
		.where(eq(evenings.id, id))
		.run();
	return result.changes > 0;
}

/** The id of the published evening with this token, or null. */
export function eveningIdByToken(token: string): number | null {
	if (!TOKEN_SHAPE.test(token)) return null;
	const row = db()
		.select({ id: evenings.id })
		.from(evenings)
		.where(and(eq(evenings.shareToken, token), eq(evenings.status, 'published')))
		.get();
	return row?.id ?? null;
}
