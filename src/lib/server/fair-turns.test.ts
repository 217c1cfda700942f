import { describe, expect, it } from 'vitest';
import { FairTurns } from './fair-turns';

/** A hand-driven event loop: `turn(ms)` lets `ms` pass, then runs what was queued for the next turn. */
function loop() {
	let clock = 0;
	let pending: Array<() => void> = [];
	return {
		now: () => clock,
		nextTurn: (fn: () => void) => void pending.push(fn),
		turn(ms: number) {
			clock += ms;
			const run = pending;
			pending = [];
			for (const fn of run) fn();
		},
		get scheduled() {
			return pending.length;
		}
	};
}

function gateWith(startPerTurn: number, targetMs = 10) {
	const l = loop();
	const gate = new FairTurns({ targetMs, startPerTurn, now: l.now, nextTurn: l.nextTurn });
	return { l, gate };
}

/** Enters `n` requests and records the order in which they are let start. */
function enterMany(gate: FairTurns, n: number, label: string, started: string[]) {
	for (let i = 0; i < n; i++) {
		const wait = gate.enter();
		if (wait) void wait.then(() => started.push(`${label}${i}`));
		else started.push(`${label}${i}`);
	}
}

const settle = () => new Promise((r) => setTimeout(r, 0));

describe('FairTurns', () => {
	it('lets a light load through without a promise', () => {
		const { gate } = gateWith(8);
		for (let i = 0; i < 8; i++) expect(gate.enter()).toBeUndefined();
		expect(gate.waiting).toBe(0);
	});

	it('queues what is over the limit of a turn and starts it in later turns, first come first served', async () => {
		const { l, gate } = gateWith(2);
		const started: string[] = [];
		enterMany(gate, 5, 'a', started);
		expect(started).toEqual(['a0', 'a1']);
		expect(gate.waiting).toBe(3);

		l.turn(1); // a short turn: the limit grows to 3, the three waiting start
		await settle();
		expect(started).toEqual(['a0', 'a1', 'a2', 'a3', 'a4']);
		expect(gate.waiting).toBe(0);
	});

	it('starts a newcomer after those already waiting', async () => {
		const { l, gate } = gateWith(1);
		const started: string[] = [];
		enterMany(gate, 3, 'a', started); // a0 starts; a1, a2 wait
		l.turn(50); // a long turn: the limit stays at 1, a1 starts
		await settle();
		enterMany(gate, 1, 'b', started);
		l.turn(50);
		await settle();
		l.turn(50);
		await settle();
		expect(started).toEqual(['a0', 'a1', 'a2', 'b0']);
	});

	it('shrinks the limit after a long turn and grows it back one by one while turns are short', () => {
		const { l, gate } = gateWith(8, 10);
		void gate.enter();
		l.turn(40);
		expect(gate.perTurn).toBe(6); // 8 × 0.75
		void gate.enter();
		l.turn(40);
		expect(gate.perTurn).toBe(4); // floor(6 × 0.75)
		void gate.enter();
		l.turn(2);
		expect(gate.perTurn).toBe(5);
		void gate.enter();
		l.turn(2);
		expect(gate.perTurn).toBe(6);
	});

	it('never lets the limit fall below one request a turn', () => {
		const { l, gate } = gateWith(2, 10);
		for (let i = 0; i < 10; i++) {
			void gate.enter();
			l.turn(500);
		}
		expect(gate.perTurn).toBe(1);
	});

	it('stops measuring after a quiet turn, so an idle server does not keep the loop spinning', () => {
		const { l, gate } = gateWith(4);
		void gate.enter();
		expect(l.scheduled).toBe(1);
		l.turn(1); // the turn had an arrival: one more turn is measured
		expect(l.scheduled).toBe(1);
		l.turn(1); // a quiet turn: nothing more is scheduled
		expect(l.scheduled).toBe(0);
		void gate.enter(); // traffic again: measuring starts again
		expect(l.scheduled).toBe(1);
	});

	it('keeps turning while anyone waits, however long the turns', async () => {
		const { l, gate } = gateWith(1);
		const started: string[] = [];
		enterMany(gate, 4, 'a', started);
		for (let i = 0; i < 3; i++) {
			expect(l.scheduled).toBe(1);
			l.turn(100);
			await settle();
		}
		expect(started).toHaveLength(4);
	});
});
