import { json } from '@sveltejs/kit';
import { requireUser } from '$lib/server/guard';
import type { RequestHandler } from './$types';

export const GET = ((event) => json(requireUser(event))) satisfies RequestHandler;
