// The preferences a finished plan does not meet, each with its reason in plain words.
import { partnerSettingWords } from './formation';
import { place } from './layout';
import type { Plan, Problem } from './model';
import { minutesWords } from './time';

function whyMissing(problem: Problem, dance: number): string {
	const d = problem.dances[dance];
	if (d.cands.length === 0) return 'no playable track fits it (or it is on the never-play list)';
	return 'no free fitting track could be placed without breaking a harder rule';
}

export function unmetPreferences(problem: Problem, plan: Plan): string[] {
	const s = problem.settings;
	const out: string[] = [...problem.inputNotes];
	const placed = place(problem, plan);
	const plays = placed.filter(
		(p) => p.item.kind === 'dance' && p.item.cand && p.item.cand.dance >= 0
	);
	const social = plays.filter((p) => !p.item.lesson);
	const name = (d: number) => problem.dances[d].name;
	for (const r of problem.requests) {
		const mine = social.filter((p) => p.item.cand!.dance === r.dance);
		if (mine.length === 0) {
			out.push(`Request for ${name(r.dance)} not met: ${whyMissing(problem, r.dance)}.`);
			continue;
		}
		if (r.section < 0) continue;
		const sec = problem.sections[r.section];
		const dist = Math.min(
			...mine.map((p) =>
				p.start < sec.startS ? sec.startS - p.start : p.start >= sec.endS ? p.start - sec.endS : 0
			)
		);
		if (dist > 0) {
			out.push(
				`Request for ${name(r.dance)} played ${minutesWords(dist)} outside its ${sec.title ?? 'request block'}.`
			);
		}
	}
	for (const m of problem.must) {
		const ok = plays.some(
			(p) => p.item.cand!.dance === m.dance && (m.track < 0 || p.item.cand!.track === m.track)
		);
		if (ok) continue;
		if (m.track === -2)
			out.push(`Must-play ${name(m.dance)}: its track is not in the music library.`);
		else if (m.track >= 0 && !problem.dances[m.dance].cands.some((c) => c.track === m.track)) {
			out.push(
				`Must-play ${name(m.dance)} to "${problem.tracks[m.track].title}": that track does not fit it.`
			);
		} else out.push(`Must-play ${name(m.dance)} not included: ${whyMissing(problem, m.dance)}.`);
	}
	problem.sections.forEach((sec, i) => {
		if (sec.kind !== 'last-dance') return;
		const mine = social.filter((p) => p.slot.section === i);
		const last = mine[mine.length - 1];
		if (!last) {
			out.push('The last-dance section has no dance.');
			return;
		}
		const d = problem.dances[last.item.cand!.dance];
		if (last.item.locked) return;
		if (!d.wellKnown)
			out.push(`The last dance, ${d.name}, is not marked well known: none free fitted the time.`);
		if (d.rank > 1)
			out.push(`The last dance, ${d.name}, is not an easy one: no easy dance fitted the time.`);
	});
	let fastRun = 0;
	let advRecent = -99;
	let prevRh = '';
	let sinceCouple = 0;
	let wide = 0;
	placed.forEach((p, idx) => {
		const c = p.item.cand;
		if (p.item.kind === 'break') {
			fastRun = 0;
			prevRh = '';
		}
		if (!c || c.dance < 0) return;
		if (p.item.lesson) {
			prevRh = problem.dances[c.dance].rhythm;
			return;
		}
		const d = problem.dances[c.dance];
		fastRun = c.eff >= s.fastBpm ? fastRun + 1 : 0;
		if (fastRun === s.maxConsecutiveFast + 1) {
			out.push(`More than ${s.maxConsecutiveFast} fast dances in a row at entry ${idx + 1}.`);
		}
		if (d.rhythm === 'waltz' && prevRh === 'waltz')
			out.push(`Two waltzes back to back at entry ${idx + 1}.`);
		if (d.rank === 4) {
			if (social.indexOf(p) - advRecent < 3)
				out.push(`Advanced dances close together at entry ${idx + 1}.`);
			advRecent = social.indexOf(p);
		}
		prevRh = d.rhythm;
		sinceCouple = d.partner ? 0 : sinceCouple + 1;
		// Two line dances past the setting's spacing: the mix has slipped (one over is ordinary).
		if (sinceCouple === s.partnerEvery + 2) wide++;
	});
	if (s.partnerEvery > 0 && problem.dances.some((d) => d.partner)) {
		if (!problem.havePartner)
			out.push('No partner dance could be planned: none in the catalogue fits a free track.');
		else if (wide > 0)
			out.push(
				`Partner dances are further apart than ${partnerSettingWords(s)} in ${wide} ${wide === 1 ? 'place' : 'places'}.`
			);
	}
	placed.forEach((p, idx) => {
		const lock = p.item.lock;
		if (lock && lock.position !== idx) {
			out.push(
				`The locked entry that was at position ${lock.position + 1} is now at position ${idx + 1}: its start time is kept, the entries before it changed.`
			);
		}
	});
	for (const p of placed) {
		if (p.item.kind === 'announcement' && !p.item.locked) {
			out.push(
				`An announcement of ${minutesWords(p.item.dur)} fills time that no fitting music could (${problem.sections[p.slot.section]?.title ?? 'a section'}).`
			);
		}
	}
	return out;
}
