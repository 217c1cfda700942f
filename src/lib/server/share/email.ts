// E-mailing the run order to the team: chosen people and/or everyone holding chosen roles, one
// message each (so nobody sees the others' addresses), the CSV and the PDF attached.
import { minutesSeconds } from '../../format';
import { inArray, isNotNull } from 'drizzle-orm';
import { ROLES, type Role } from '../../domain';
import { db } from '../db';
import { userRoles, users } from '../db/schema';
import { sendMail } from '../mail/send';
import { CARE_NOTE, SOUND_CAUTION } from './cautions';
import { buildCsv } from './csv';
import { buildPdf } from './pdf';
import {
	effectiveBpm,
	fileStem,
	entryTitle,
	KIND_LABELS,
	rateText,
	trackLine,
	wallDate,
	wallTime,
	type RunSheet
} from './sheet';

export interface TeamMember {
	id: number;
	name: string;
	email: string;
	roles: Role[];
}

/** People who have an account in use (a password set), with their roles. */
export function teamMembers(): TeamMember[] {
	const people = db()
		.select({ id: users.id, name: users.name, email: users.email })
		.from(users)
		.where(isNotNull(users.passwordHash))
		.orderBy(users.name)
		.all();
	const roles = db().select().from(userRoles).all();
	return people.map((p) => ({
		...p,
		roles: ROLES.filter((r) => roles.some((x) => x.userId === p.id && x.role === r))
	}));
}

/** Everyone chosen by id or by role, once each. */
export function chooseRecipients(choice: { roles?: Role[]; userIds?: number[] }): TeamMember[] {
	const ids = choice.userIds ?? [];
	const wanted = choice.roles ?? [];
	if (ids.length === 0 && wanted.length === 0) return [];
	const byRole = wanted.length
		? db()
				.select({ userId: userRoles.userId })
				.from(userRoles)
				.where(inArray(userRoles.role, wanted))
				.all()
				.map((r) => r.userId)
		: [];
	const chosen = new Set([...ids, ...byRole]);
	return teamMembers().filter((m) => chosen.has(m.id));
}

const oneLine = (s: string) => s.replace(/[\r\n]+/g, ' ').trim();

export function runOrderText(sheet: RunSheet, message: string, eveningUrl: string): string {
	const at = (ms: number) => wallTime(ms, sheet.timeZone);
	const lines = [
		`${sheet.title}`,
		`${wallDate(sheet.startsAt, sheet.timeZone)}, ${at(sheet.startsAt)}–${at(sheet.endsAt)}`
	];
	if (sheet.venue) lines.push(sheet.venue);
	if (message.trim()) lines.push('', message.trim());
	lines.push('', 'Run order');
	if (sheet.entries.length === 0) lines.push('(no run order yet)');
	for (const e of sheet.entries) {
		const kind = e.kind === 'dance' ? '' : `${KIND_LABELS[e.kind]}: `;
		const tempo =
			e.bpm === null
				? ''
				: `, ${effectiveBpm(e)} BPM${e.rate === 1 ? '' : ` (×${rateText(e.rate)})`}`;
		const track = trackLine(e) ? ` — ${trackLine(e)}` : '';
		const lock = e.locked ? ' [locked]' : '';
		lines.push(
			`${at(e.startsAt)}  ${kind}${oneLine(entryTitle(e))}${track}${tempo}, ${minutesSeconds(e.durationS)}${lock}`
		);
	}
	lines.push('', `The evening in Floorset: ${eveningUrl}`);
	if (sheet.shareUrl) lines.push(`The dancers' page: ${sheet.shareUrl}`);
	lines.push('', SOUND_CAUTION, CARE_NOTE, '', 'Attached: the run order as CSV and as a PDF.');
	return lines.join('\n');
}

export async function sendRunOrder(
	sheet: RunSheet,
	recipients: TeamMember[],
	options: { message: string; origin: string; senderName: string }
): Promise<number> {
	const [csv, pdf] = [buildCsv(sheet), await buildPdf(sheet)];
	const eveningUrl = `${options.origin.replace(/\/$/, '')}/evenings/${sheet.id}`;
	const text = runOrderText(sheet, options.message, eveningUrl);
	const subject = oneLine(
		`Run order: ${sheet.title} (${wallDate(sheet.startsAt, sheet.timeZone)})`
	);
	const attachments = [
		{ filename: `${fileStem(sheet)}.csv`, content: csv, contentType: 'text/csv; charset=utf-8' },
		{ filename: `${fileStem(sheet)}.pdf`, content: pdf, contentType: 'application/pdf' }
	];
	let sent = 0;
	for (const person of recipients) {
		await sendMail({
			// The bare address: a display name with a comma in it would split into two addresses.
			to: person.email,
			subject,
			text: `Hello ${person.name.split(/\s+/)[0]},\n\n${options.senderName} sends you the run order.\n\n${text}`,
			attachments
		});
		sent++;
	}
	return sent;
}
