import { json } from '@sveltejs/kit';
import { sql } from 'drizzle-orm';
import { db } from '$lib/server/db';
import { publicRoute } from '$lib/server/guard';
import pkg from '../../../package.json';
import type { RequestHandler } from './$types';

export const GET = ((event) => {
	publicRoute(event);
	let dbState = 'ok';
	try {
		db().get(sql`select 1`);
	} catch {
		dbState = 'unavailable';
	}
	return json(
		{ ok: dbState === 'ok', db: dbState, version: pkg.version },
		{ status: dbState === 'ok' ? 200 : 503 }
	);
}) satisfies RequestHandler;
