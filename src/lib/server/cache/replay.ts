// A Response over bytes that are kept and sent many times. Handing a Uint8Array to `new
// Response` makes the fetch implementation copy it for every response (a 100 KB page under load
// means megabytes of garbage a second); a one-chunk stream over the same bytes copies nothing.
// Nothing writes to the kept bytes, so many responses may send them at once.
export function replayBytes(body: Uint8Array, init: { status?: number; headers: HeadersInit }) {
	const stream = new ReadableStream<Uint8Array>({
		start(controller) {
			controller.enqueue(body);
			controller.close();
		}
	});
	return new Response(stream, init);
}
