// A refusal the routes turn into a status and a message (422 bad input, 404 missing, 409 stale).
export class EveningError extends Error {
	constructor(
		message: string,
		readonly status: 404 | 409 | 422 | 429 | 503,
		readonly extra: Record<string, unknown> = {}
	) {
		super(message);
	}
}
