// The public evening with its times written out in the club's zone, so the server and the
// browser show the same words whatever zone the visitor's device is in.
import { LEVEL_LABELS } from '$lib/domain';
import type { PublicEvening } from '$lib/server/share/public-evening';
import { minutesSeconds } from '$lib/format';
import { SECTION_LABELS, wallDate, wallTime } from '$lib/server/share/sheet';

export function publicView(e: PublicEvening) {
	const at = (ms: number) => wallTime(ms, e.timeZone);
	return {
		title: e.title,
		venue: e.venue,
		date: wallDate(e.startsAt, e.timeZone),
		from: at(e.startsAt),
		to: at(e.endsAt),
		shareUrl: e.shareUrl,
		sections: e.sections.map((s) => ({
			from: at(s.startsAt),
			to: at(s.endsAt),
			title: s.title || SECTION_LABELS[s.kind],
			kind: SECTION_LABELS[s.kind],
			dance: s.danceName,
			teacher: s.teacherFirstName
		})),
		entries: e.entries.map((x) => ({
			position: x.position,
			time: at(x.startsAt),
			kind: x.kind,
			dance: x.danceName,
			level: x.level ? LEVEL_LABELS[x.level] : null,
			partner: x.partner,
			length: minutesSeconds(x.durationS)
		}))
	};
}
