// Fills the fixed slots: a lesson's teach, walkthrough and its dance at lesson tempo, and break
// sections. These do not change during the search.
import { danceItem, fixedItem, stretchItem } from './items';
import type { Plan, Problem, Slot } from './model';
import { isLessonTempo, lessonCands } from './prepare';

// A hair of slack so that a track exactly as long as the slot still fits despite rounding.
const room = (s: Slot) => s.target - s.start + 1e-6;

function fillLesson(problem: Problem, slots: Slot[], dance: number, used: Set<number>): void {
	const { gapS, teachLengthMin, walkthroughLengthMin } = problem.settings;
	const free = slots.filter((s) => s.items.length === 0);
	// Locked plays inside the lesson belong to it: no repeat rule, no social-dance preferences.
	for (const s of slots)
		for (const i of s.items) if (i.locked && i.kind === 'dance' && i.cand) i.lesson = true;
	const hasLockedPlay = slots.some((s) =>
		s.items.some(
			(i) =>
				i.locked && i.kind === 'dance' && i.cand?.dance === dance && isLessonTempo(problem, i.cand)
		)
	);
	const main = hasLockedPlay
		? null
		: free.reduce<Slot | null>((a, s) => (a && room(a) >= room(s) ? a : s), null);
	for (const s of free) if (s !== main && room(s) >= 60) s.items.push(stretchItem('teach', 0));
	if (!main) {
		if (!hasLockedPlay) {
			problem.inputViolations.push(
				`Locked entries fill the lesson, leaving no room to play ${problem.dances[dance].name} at lesson tempo.`
			);
		}
		return;
	}
	const full = problem.dances[dance].full;
	// Prefer a lesson track that leaves another full-tempo track for the reprise.
	const options = lessonCands(problem, dance).filter((c) => !used.has(c.track));
	options.sort(
		(a, b) =>
			Number(full.some((f) => f.track !== b.track)) - Number(full.some((f) => f.track !== a.track))
	);
	const teach = teachLengthMin * 60;
	const walk = walkthroughLengthMin * 60;
	const taught = slots.some((s) => s.items.some((i) => i.locked && i.kind === 'teach'));
	const teachMins = taught ? [0] : [teach, Math.min(teach, 120)];
	for (const withWalk of walk > 0 ? [true, false] : [false]) {
		for (const minTeach of teachMins) {
			const walkPart = withWalk ? walk + gapS : 0;
			const pick = options.find(
				(c) =>
					minTeach + gapS + walkPart + c.dur <= room(main) ||
					(minTeach === 0 && walkPart + c.dur <= room(main))
			);
			if (!pick) continue;
			// With the teach locked elsewhere, more teaching is added only to fill spare time.
			const spare = room(main) - walkPart - pick.dur;
			if (minTeach > 0 || spare > 60) main.items.push(stretchItem('teach', minTeach));
			if (withWalk) main.items.push(fixedItem('walkthrough', walk));
			main.items.push(danceItem(pick, true));
			used.add(pick.track);
			return;
		}
	}
	main.items.push(stretchItem('teach', 0));
	problem.inputViolations.push(
		`No track fits ${problem.dances[dance].name} at lesson tempo within the lesson's time, so the lesson has no practice dance.`
	);
}

/** Fills lesson and break slots in place; returns the tracks they use. */
export function fillFixedSlots(problem: Problem, plan: Plan): Set<number> {
	const used = new Set<number>();
	for (const s of plan)
		for (const i of s.items) if (i.cand && i.cand.track >= 0) used.add(i.cand.track);
	problem.sections.forEach((sec, si) => {
		const mine = plan.filter(
			(s) => s.section === si && s.kind === 'fixed' && !s.items.some((i) => i.locked)
		);
		const all = plan.filter((s) => s.section === si);
		if (sec.kind === 'break') {
			for (const s of mine) s.items.push(stretchItem('break', 0));
		} else if (sec.kind === 'lesson') {
			if (sec.dance >= 0) fillLesson(problem, all, sec.dance, used);
			else for (const s of mine) s.items.push(stretchItem('teach', 0));
		}
	});
	return used;
}
