// Who may read an evening's exports and print sheet: the team (readEvenings) always; a person
// who is only a dancer just for published evenings. A draft is "not found" to them, so the
// answer tells nothing about which drafts exist.
import { error } from '@sveltejs/kit';
import { idParam } from '../../route-id';
import { config } from '../config';
import type { SessionUser } from '../users';
import { loadSheet } from './load-sheet';
import { fileStem, type RunSheet } from './sheet';

export function notFound(message = 'No such evening.'): never {
	error(404, { message, error: message });
}

export function eveningId(raw: string): number {
	return idParam(raw) ?? notFound();
}

export const isTeam = (user: SessionUser) => user.roles.some((r) => r !== 'dancer');

/**
 * The run sheet of evening `rawId` for a person the route let through with
 * requireRight(event, 'readEvenings'); 404 for a draft when they are only a dancer.
 */
export function readableSheet(user: SessionUser, rawId: string): RunSheet {
	const sheet = loadSheet(eveningId(rawId), config().origin);
	if (!sheet || (!isTeam(user) && !sheet.published)) notFound();
	return sheet;
}

/** Attachment headers, named by the evening's title and date reduced to [a-z0-9-] (fileStem). */
export function download(body: BodyInit, type: string, sheet: RunSheet, ext: string): Response {
	return new Response(body, {
		headers: {
			'content-type': type,
			'content-disposition': `attachment; filename="${fileStem(sheet)}.${ext}"`,
			'cache-control': 'private, no-store'
		}
	});
}
