// Reads and validates a JSON request body; bad input becomes a clear 4xx and nothing changes.
import { json } from '@sveltejs/kit';
import type { z } from 'zod';

export const MAX_JSON_BYTES = 1024 * 1024;

type Result<T> = { ok: true; data: T } | { ok: false; response: Response };

export const badRequest = (message: string, status = 400, extra: object = {}) =>
	json({ error: message, ...extra }, { status });

/**
 * A refusal of a body too large to keep. The body is still read through and thrown away (never
 * held: BODY_SIZE_LIMIT bounds how much arrives): answered early, with the client still sending,
 * the unread rest stalled the connection until it timed out, and closing instead cut clients off
 * before they read the answer.
 */
export async function refuseAfterDraining(
	request: Request,
	message: string,
	status: number,
	extra: object = {}
): Promise<Response> {
	try {
		await request.body?.pipeTo(new WritableStream());
	} catch {
		/* past BODY_SIZE_LIMIT the server cuts the body off itself; the answer is the same */
	}
	return badRequest(message, status, extra);
}

/** The first problem of a zod error in words a person understands, with where it is. */
export function describeIssue(error: z.ZodError): string {
	const issue = error.issues[0];
	if (!issue) return 'The request is not valid.';
	const where = issue.path.length ? `${issue.path.join('.')}: ` : '';
	return `${where}${issue.message}`;
}

/** The body parsed as JSON (type and size checked), not yet validated. */
export async function readJsonValue(request: Request): Promise<Result<unknown>> {
	const type = request.headers.get('content-type') ?? '';
	if (!type.includes('application/json')) {
		return { ok: false, response: badRequest('Send the body as application/json.', 415) };
	}
	const length = Number(request.headers.get('content-length') ?? 0);
	if (length > MAX_JSON_BYTES) {
		const message = 'The request body is too large.';
		return { ok: false, response: await refuseAfterDraining(request, message, 413) };
	}
	const text = await request.text();
	if (text.length > MAX_JSON_BYTES) {
		return { ok: false, response: badRequest('The request body is too large.', 413) };
	}
	try {
		return { ok: true, data: JSON.parse(text) as unknown };
	} catch {
		return { ok: false, response: badRequest('The body is not valid JSON.') };
	}
}

/** A parsed body checked against its schema; the first problem becomes a 422 in words. */
export function validateJson<S extends z.ZodType>(value: unknown, schema: S): Result<z.infer<S>> {
	const parsed = schema.safeParse(value);
	if (!parsed.success) {
		return { ok: false, response: badRequest(describeIssue(parsed.error), 422) };
	}
	return { ok: true, data: parsed.data };
}

export async function readJson<S extends z.ZodType>(
	request: Request,
	schema: S
): Promise<Result<z.infer<S>>> {
	const value = await readJsonValue(request);
	return value.ok ? validateJson(value.data, schema) : value;
}
