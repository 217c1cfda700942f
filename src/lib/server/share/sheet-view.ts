// The run sheet with every figure written out as the PDF writes it, for the print page.
import { minutesSeconds } from '../../format';
import { CARE_NOTE, SOUND_CAUTION } from './cautions';
import {
	CROWD_LABELS,
	effectiveBpm,
	entryTitle,
	KIND_LABELS,
	rateText,
	SECTION_LABELS,
	trackLine,
	wallDate,
	wallTime,
	type RunSheet
} from './sheet';

export function sheetView(sheet: RunSheet) {
	const at = (ms: number) => wallTime(ms, sheet.timeZone);
	return {
		id: sheet.id,
		title: sheet.title,
		date: wallDate(sheet.startsAt, sheet.timeZone),
		from: at(sheet.startsAt),
		to: at(sheet.endsAt),
		venue: sheet.venue,
		crowd: CROWD_LABELS[sheet.crowd],
		notes: sheet.notes,
		shareUrl: sheet.shareUrl,
		sections: sheet.sections.map((s) => ({
			from: at(s.startsAt),
			to: at(s.endsAt),
			title: s.title || SECTION_LABELS[s.kind],
			dance: s.title ? null : s.danceName,
			teacher: s.teacherFirstName
		})),
		entries: sheet.entries.map((e) => ({
			position: e.position,
			time: at(e.startsAt),
			// The print says "partner dance" beside it, so the floor finds partners in time.
			kind:
				e.kind !== 'dance' ? KIND_LABELS[e.kind] : e.formation === 'partner' ? 'Partner dance' : '',
			title: entryTitle(e),
			track: trackLine(e),
			note: e.danceName && e.text.trim() ? e.text.trim() : '',
			tempo:
				e.bpm === null
					? ''
					: e.rate === 1
						? `${Math.round(e.bpm * 10) / 10} BPM`
						: `${Math.round(e.bpm * 10) / 10} × ${rateText(e.rate)} = ${effectiveBpm(e)}`,
			length: minutesSeconds(e.durationS),
			locked: e.locked
		})),
		soundCaution: SOUND_CAUTION,
		careNote: CARE_NOTE
	};
}
