import { desc } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { outbox } from '$lib/server/db/schema';
import { requireRight } from '$lib/server/guard';
import { mailIsCaptured } from '$lib/server/mail/send';
import type { PageServerLoad } from './$types';

export const load = ((event) => {
	requireRight(event, 'outbox');
	const messages = db()
		.select({
			id: outbox.id,
			from: outbox.from,
			to: outbox.to,
			subject: outbox.subject,
			text: outbox.text,
			attachments: outbox.attachments,
			createdAt: outbox.createdAt
		})
		.from(outbox)
		.orderBy(desc(outbox.id))
		.limit(100)
		.all();
	return { messages, captured: mailIsCaptured() };
}) satisfies PageServerLoad;
