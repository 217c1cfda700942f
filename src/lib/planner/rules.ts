// The hard rules, checked on a laid-out plan and reported in plain words. The search keeps them
// through the objective's penalty; this check says which (if any) the input made impossible.
import { musicEnd, trailingBreak } from './breaks';
import { place, slotEnd } from './layout';
import type { Plan, Problem } from './model';
import { isLessonTempo } from './prepare';
import { partnerTwice } from './formation';
import { restLimitS, restSettingWords } from './settings';
import { minutesWords } from './time';

const EPS = 1e-6;

export function checkHardRules(problem: Problem, plan: Plan): string[] {
	const placed = place(problem, plan);
	const s = problem.settings;
	const out: string[] = [];
	const name = (d: number) => problem.dances[d]?.name ?? 'a dance';
	const lastStart = new Map<number, number>();
	const trackSeen = new Set<number>();
	let dancing = 0;
	let advRun = 0;
	let lastEnd = 0;
	let prevPartner = false;
	placed.forEach(({ item, start }, pos) => {
		const end = start + item.dur;
		if (start - lastEnd >= s.breakLengthMin * 60) {
			dancing = 0;
			prevPartner = false;
		}
		lastEnd = end;
		if (end > problem.eveningS + EPS && !item.locked) {
			out.push(`Entry ${pos + 1} ends after the evening's end.`);
		}
		if (item.kind === 'break') {
			dancing = 0;
			advRun = 0;
			prevPartner = false;
			return;
		}
		if (item.kind === 'dance' || item.kind === 'walkthrough') {
			dancing += item.dur;
			if (dancing > restLimitS(s) + EPS) {
				out.push(
					`Entry ${pos + 1} comes after ${minutesWords(dancing)} of dancing, past ${restSettingWords(s)}.`
				);
			}
		}
		const c = item.cand;
		if (item.kind !== 'dance' || !c || c.dance < 0) return;
		if (!item.lesson) {
			const prev = lastStart.get(c.dance);
			if (prev !== undefined && start - prev < s.repeatWindowMin * 60 - EPS) {
				out.push(`${name(c.dance)} is played twice within ${s.repeatWindowMin} minutes.`);
			}
			lastStart.set(c.dance, start);
			advRun = problem.dances[c.dance].rank === 4 ? advRun + 1 : 0;
			if (advRun === 3) out.push(`Three advanced dances in a row end at entry ${pos + 1}.`);
			if (!item.locked && partnerTwice(s, prevPartner, problem.dances[c.dance].partner))
				out.push(`Entry ${pos + 1} is a second partner dance in a row.`);
		}
		prevPartner = problem.dances[c.dance].partner;
		if (c.track >= 0) {
			if (trackSeen.has(c.track))
				out.push(`The track "${problem.tracks[c.track].title}" is played twice.`);
			trackSeen.add(c.track);
		}
	});
	for (const slot of plan) {
		if (slot.lo === -Infinity) continue;
		const end = slotEnd(problem, slot);
		const title = problem.sections[slot.section]?.title ?? problem.sections[slot.section]?.kind;
		if (end > slot.hi + EPS)
			out.push(`The ${title} runs ${minutesWords(end - slot.hi)} over its time.`);
		const br = trailingBreak(slot);
		if (br) {
			const idle = slot.target - s.gapS - br.maxDur - musicEnd(problem, slot);
			if (idle > s.endToleranceS + EPS) {
				out.push(
					`The ${title} has ${minutesWords(idle)} without music before its break: not enough music fits.`
				);
			}
		}
		if (end < slot.lo - EPS)
			out.push(`The ${title} ends ${minutesWords(slot.lo - end)} early: not enough music fits.`);
	}
	for (const l of problem.lessons) {
		const inLesson = placed.some(
			(p) =>
				p.slot.section === l.section &&
				p.item.kind === 'dance' &&
				p.item.cand?.dance === l.dance &&
				p.item.lesson &&
				(!p.item.locked || isLessonTempo(problem, p.item.cand))
		);
		if (!inLesson)
			out.push(`The lesson has no practice dance of ${name(l.dance)} at lesson tempo.`);
		const again = placed.some(
			(p) =>
				!p.item.lesson &&
				p.item.cand?.dance === l.dance &&
				p.start >= l.endS - EPS &&
				Math.abs(p.item.cand.rate - 1) <= s.fullTempoTolerance + EPS
		);
		if (!again) out.push(`${name(l.dance)} is not danced again at full tempo after the lesson.`);
	}
	return [...new Set(out)];
}
