// Since libuv 1.45 (Node 20) a listening socket accepts one connection per turn of the event loop
// (libuv pull request #3696, "unix: don't accept() connections in a loop"). When the server is
// saturated, one turn runs every request that became readable since the last, so a turn takes
// tens of milliseconds and a crowd of new connections waits in the kernel's accept queue for
// seconds: the load benchmark's 200 connections, opened at once, saw first answers after up to
// 10 s while the median was 100 ms. A phone that opens the public page while the floor is busy
// is exactly such a newcomer.
//
// FairTurns lets only so many requests start their work in one turn and queues the rest, first
// come first served, to start in later turns. Turns stay short (near `targetMs`), so the loop
// comes back to the accept queue often, and a new connection waits behind the requests already
// read, not behind every turn they make. The number let through per turn adapts: it shrinks when
// a turn runs long and grows while turns are short, so a quiet server never queues anything.

export interface FairTurnsOptions {
	/** The turn length to aim for, in milliseconds. */
	targetMs: number;
	/** Requests let through in a turn before any turn has been measured. */
	startPerTurn?: number;
	maxPerTurn?: number;
	now?: () => number;
	/** Runs `fn` in the next turn of the event loop, after its I/O (Node's `setImmediate`). */
	nextTurn?: (fn: () => void) => void;
}

export class FairTurns {
	#target: number;
	#max: number;
	#now: () => number;
	#nextTurn: (fn: () => void) => void;
	#queue: Array<() => void> = [];
	#perTurn: number;
	#started = 0;
	#ticking = false;
	#arrived = false;
	#turnBegan = 0;

	constructor(options: FairTurnsOptions) {
		this.#target = options.targetMs;
		this.#max = options.maxPerTurn ?? 256;
		this.#perTurn = Math.min(options.startPerTurn ?? 8, this.#max);
		this.#now = options.now ?? (() => performance.now());
		this.#nextTurn = options.nextTurn ?? ((fn) => setImmediate(fn));
	}

	/** How many requests may start in one turn now. */
	get perTurn() {
		return this.#perTurn;
	}

	/** Requests waiting for a later turn. */
	get waiting() {
		return this.#queue.length;
	}

	/**
	 * Call before a request's work. Returns nothing when the request may start now (no promise,
	 * so an unloaded server pays no extra microtask), else a promise that settles in the turn in
	 * which it may start.
	 */
	enter(): Promise<void> | undefined {
		this.#arrived = true;
		if (!this.#ticking) {
			this.#ticking = true;
			this.#turnBegan = this.#now();
			this.#started = 0;
			this.#nextTurn(() => this.#tick());
		}
		if (this.#queue.length === 0 && this.#started < this.#perTurn) {
			this.#started++;
			return undefined;
		}
		return new Promise((resolve) => this.#queue.push(resolve));
	}

	/** Once per turn while there is traffic: measure the turn, adapt, start the next in line. */
	#tick() {
		const now = this.#now();
		const length = now - this.#turnBegan;
		this.#turnBegan = now;
		// Shrink fast, grow slowly (additive increase, multiplicative decrease), so one long turn
		// is corrected at once and the limit creeps back up while turns stay short.
		if (length > this.#target) this.#perTurn = Math.max(1, Math.floor(this.#perTurn * 0.75));
		else this.#perTurn = Math.min(this.#max, this.#perTurn + 1);

		this.#started = 0;
		while (this.#started < this.#perTurn && this.#queue.length > 0) {
			this.#started++;
			this.#queue.shift()!();
		}
		// Keep measuring while requests keep coming or wait; stop after one quiet turn, so an idle
		// server does not spin (a pending immediate makes the loop poll without blocking).
		if (this.#queue.length > 0 || this.#arrived || this.#started > 0) {
			this.#arrived = false;
			this.#nextTurn(() => this.#tick());
		} else {
			this.#ticking = false;
		}
	}
}
