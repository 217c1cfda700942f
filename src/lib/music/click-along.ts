// A soft click on the beat grid while the track plays, so the DJ's ear can judge the reading.
// The usual look-ahead scheduling for Web Audio: a timer every 25 ms schedules the clicks of
// the next 150 ms on the audio clock, which keeps them steady whatever the page is doing
// (C. Wilson, "A Tale of Two Clocks", web.dev, 2013 — from memory).
import { clicksBetween } from './click-times';

const TICK_MS = 25;
const AHEAD_S = 0.15;
/** Peak gain of a click: under the music, not over it. */
const LEVEL = 0.18;

export interface Grid {
	bpm: number;
	offsetS: number;
	meter: number;
}

export class ClickAlong {
	private ctx: AudioContext | null = null;
	private timer: ReturnType<typeof setInterval> | null = null;
	private until = -1;
	private grid: Grid;

	constructor(
		private readonly audio: HTMLAudioElement,
		grid: Grid,
		/** Told of every click scheduled (the page counts them, and its test reads the count). */
		private readonly onClick?: () => void
	) {
		this.grid = grid;
	}

	get running(): boolean {
		return this.timer !== null;
	}

	/** Must be called from a click or key press: browsers start audio only on a gesture. */
	start(): void {
		this.ctx ??= new AudioContext();
		void this.ctx.resume();
		this.until = -1;
		this.timer ??= setInterval(() => this.tick(), TICK_MS);
	}

	stop(): void {
		if (this.timer !== null) clearInterval(this.timer);
		this.timer = null;
	}

	/** Switches to another reading; clicks already queued (under 150 ms) still sound. */
	setGrid(grid: Grid): void {
		this.grid = grid;
		this.until = this.audio.currentTime;
	}

	close(): void {
		this.stop();
		void this.ctx?.close();
		this.ctx = null;
	}

	private tick(): void {
		const ctx = this.ctx;
		if (!ctx || this.audio.paused) return;
		const now = this.audio.currentTime;
		const rate = this.audio.playbackRate || 1;
		// After a seek, start again from where the track is now.
		if (this.until < now - 0.5 || this.until > now + 1) this.until = now;
		const to = now + AHEAD_S * rate;
		for (const c of clicksBetween(this.until, to, this.grid))
			this.click(ctx, ctx.currentTime + Math.max(0, (c.atS - now) / rate), c.downbeat);
		this.until = to;
	}

	private click(ctx: AudioContext, when: number, downbeat: boolean): void {
		const osc = ctx.createOscillator();
		const gain = ctx.createGain();
		osc.frequency.value = downbeat ? 1500 : 1000;
		gain.gain.setValueAtTime(0, when);
		gain.gain.linearRampToValueAtTime(LEVEL, when + 0.002);
		gain.gain.exponentialRampToValueAtTime(0.001, when + 0.04);
		osc.connect(gain).connect(ctx.destination);
		osc.start(when);
		osc.stop(when + 0.05);
		this.onClick?.();
	}
}
