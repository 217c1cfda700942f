// Bytes kept to be sent many times, with their gzip form made once, the first time a client
// that accepts it asks. Every browser sends `Accept-Encoding: gzip`, and the app is served by
// adapter-node with nothing in front of it that would compress: a 55 KB page of the music table
// goes out as about 8 KB, a public evening page of 120 KB as about 12 KB.
import { gzipSync } from 'node:zlib';

/** Below this, compressing saves too little to be worth it. */
const MIN_TO_COMPRESS = 1024;

export class CachedBody {
	#gzip: Uint8Array | undefined;

	constructor(readonly bytes: Uint8Array) {}

	/** What the cache counts: the bytes and room for their gzip form. */
	get byteLength() {
		return Math.ceil(this.bytes.byteLength * 1.25);
	}

	gzip(): Uint8Array {
		this.#gzip ??= new Uint8Array(gzipSync(this.bytes, { level: 6 }));
		return this.#gzip;
	}

	/**
	 * A response over the kept bytes, gzipped when the request accepts it and it is worth it.
	 * `headers` may carry a strong ETag; the gzip form gets its own (RFC 9110 §8.8.3).
	 */
	respond(request: Request, init: { status?: number; headers: HeadersInit }): Response {
		const headers = new Headers(init.headers);
		headers.append('vary', 'accept-encoding');
		let body = this.bytes;
		if (body.byteLength >= MIN_TO_COMPRESS && acceptsGzip(request.headers.get('accept-encoding'))) {
			body = this.gzip();
			headers.set('content-encoding', 'gzip');
			const etag = headers.get('etag');
			if (etag?.endsWith('"')) headers.set('etag', `${etag.slice(0, -1)}-gzip"`);
		}
		// RFC 9110 §13.1.2: the client already holds this form; §15.4.5: 304, with no body.
		const etag = headers.get('etag');
		if (etag && (init.status ?? 200) === 200 && matchesNoneMatch(request, etag)) {
			headers.delete('content-encoding');
			return new Response(null, { status: 304, headers });
		}
		headers.set('content-length', String(body.byteLength));
		return replayBytes(body, { status: init.status, headers });
	}
}

/** Whether a GET's If-None-Match names `etag` (weak comparison, RFC 9110 §8.8.3.2) or is "*". */
export function matchesNoneMatch(request: Request, etag: string): boolean {
	const header = request.headers.get('if-none-match');
	if (!header || (request.method !== 'GET' && request.method !== 'HEAD')) return false;
	const opaque = (tag: string) => tag.trim().replace(/^W\//, '');
	return header.split(',').some((t) => t.trim() === '*' || opaque(t) === opaque(etag));
}

/** Whether an Accept-Encoding header (RFC 9110 §12.5.3) allows gzip: named or `*`, q above 0. */
export function acceptsGzip(header: string | null): boolean {
	if (!header) return false;
	let star: boolean | undefined;
	for (const part of header.split(',')) {
		const [name, ...params] = part.trim().toLowerCase().split(';');
		const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
		const allowed = q === undefined || Number(q.slice(2)) > 0;
		if (name.trim() === 'gzip' || name.trim() === 'x-gzip') return allowed;
		if (name.trim() === '*') star = allowed;
	}
	return star ?? false;
}

// Handing a Uint8Array to `new Response` makes the fetch implementation copy it for every
// response (a 100 KB page under load means megabytes of garbage a second); a one-chunk stream
// over the same bytes copies nothing. Nothing writes to kept bytes, so many responses may send
// them at once.
function replayBytes(body: Uint8Array, init: { status?: number; headers: Headers }) {
	const stream = new ReadableStream<Uint8Array>({
		start(controller) {
			controller.enqueue(body);
			controller.close();
		}
	});
	return new Response(stream, init);
}
