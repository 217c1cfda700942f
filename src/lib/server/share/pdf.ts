// The run sheet as a PDF, made on the server with pdfkit in the app's own shipped font (Atkinson
// Hyperlegible, as TrueType: fonts/README.md). Large type: the
// sheet is read at arm's length in a dim hall. It draws the same view as the print page.
import PDFDocument from 'pdfkit';
import type { RunSheet } from './sheet';
import { sheetView } from './sheet-view';
import regular from './fonts/atkinson-hyperlegible-latin-400.ttf?inline';
import bold from './fonts/atkinson-hyperlegible-latin-700.ttf?inline';

type View = ReturnType<typeof sheetView>;
type Row = View['entries'][number];
type Doc = InstanceType<typeof PDFDocument>;

// The shipped TrueType files (fonts/README.md), inlined into the server bundle by Vite.
const FONTS = { 400: regular, 700: bold } as const;
const fonts = new Map<400 | 700, Buffer>();
function font(weight: 400 | 700): Buffer {
	let bytes = fonts.get(weight);
	if (!bytes) {
		bytes = Buffer.from(FONTS[weight].slice(FONTS[weight].indexOf(',') + 1), 'base64');
		fonts.set(weight, bytes);
	}
	return bytes;
}

const MARGIN = 48;
const INK = '#2e2119';
const MUTED = '#5f5044';
// Column left edges in points from the margin, on A4 (595 pt wide, 499 pt between margins).
const COL = { time: 0, what: 52, tempo: 330, length: 448 } as const;
const WHAT_WIDTH = COL.tempo - COL.what - 8;

function tableHead(doc: Doc) {
	const y = doc.y;
	doc.font('bold').fontSize(11).fillColor(MUTED);
	doc.text('Time', MARGIN + COL.time, y);
	doc.text('What', MARGIN + COL.what, y);
	doc.text('Tempo', MARGIN + COL.tempo, y);
	doc.text('Length', MARGIN + COL.length, y);
	doc.moveDown(0.3).fillColor(INK);
}

function entryRow(doc: Doc, e: Row) {
	const title = e.kind ? `${e.kind}: ${e.title}` : e.title;
	const sub = [e.track, e.note, e.locked ? 'locked' : ''].filter(Boolean).join(' · ');
	const titleHeight = doc.font('bold').fontSize(13).heightOfString(title, { width: WHAT_WIDTH });
	const subHeight = sub
		? doc.font('body').fontSize(11).heightOfString(sub, { width: WHAT_WIDTH })
		: 0;
	const tempoHeight = doc
		.font('body')
		.fontSize(13)
		.heightOfString(e.tempo || ' ', { width: COL.length - COL.tempo - 6 });
	const height = Math.max(titleHeight + subHeight, tempoHeight) + 6;
	if (doc.y + height > doc.page.height - MARGIN - 24) {
		doc.addPage();
		tableHead(doc);
	}
	const y = doc.y;
	doc.font('body').fontSize(13).fillColor(INK);
	doc.text(e.time, MARGIN + COL.time, y);
	doc.text(e.tempo, MARGIN + COL.tempo, y, { width: COL.length - COL.tempo - 6 });
	doc.text(e.length, MARGIN + COL.length, y);
	doc.font('bold').text(title, MARGIN + COL.what, y, { width: WHAT_WIDTH });
	if (sub) doc.font('body').fontSize(11).fillColor(MUTED).text(sub, { width: WHAT_WIDTH });
	doc.fillColor(INK);
	doc.y = y + height;
}

function heading(doc: Doc, v: View, width: number) {
	doc.font('bold').fontSize(24).fillColor(INK).text(v.title, { width });
	doc.font('body').fontSize(13);
	doc.text(`${v.date}, ${v.from}–${v.to}`);
	if (v.venue) doc.text(v.venue, { width });
	doc.text(`Crowd: ${v.crowd}`);
	if (v.notes) doc.moveDown(0.4).text(v.notes, { width });
	if (v.sections.length) {
		doc.moveDown(0.8).font('bold').fontSize(16).text('Sections');
		doc.font('body').fontSize(13);
		for (const s of v.sections) {
			const dance = s.dance ? `: ${s.dance}` : '';
			const teacher = s.teacher ? `, taught by ${s.teacher}` : '';
			doc.text(`${s.from}–${s.to}  ${s.title}${dance}${teacher}`, MARGIN, doc.y, { width });
		}
	}
}

function footers(doc: Doc, v: View, width: number) {
	const range = doc.bufferedPageRange();
	for (let i = range.start; i < range.start + range.count; i++) {
		doc.switchToPage(i);
		// Text inside the bottom margin would start a new page: lift the margin for the footer.
		doc.page.margins.bottom = 0;
		doc.font('body').fontSize(10).fillColor(MUTED);
		doc.text(
			`Floorset · ${v.title} · page ${i + 1} of ${range.count}`,
			MARGIN,
			doc.page.height - 36,
			{
				width,
				lineBreak: false
			}
		);
	}
}

export function buildPdf(sheet: RunSheet): Promise<Buffer> {
	const v = sheetView(sheet);
	const doc = new PDFDocument({
		size: 'A4',
		margin: MARGIN,
		bufferPages: true,
		info: { Title: `Run sheet: ${v.title}`, Creator: 'Floorset' }
	});
	doc.registerFont('body', font(400));
	doc.registerFont('bold', font(700));
	const done = new Promise<Buffer>((resolve, reject) => {
		const chunks: Buffer[] = [];
		doc.on('data', (c: Buffer) => chunks.push(c));
		doc.on('end', () => resolve(Buffer.concat(chunks)));
		doc.on('error', reject);
	});
	const width = doc.page.width - 2 * MARGIN;

	heading(doc, v, width);
	doc.moveDown(0.8).font('bold').fontSize(16).fillColor(INK).text('Run order', MARGIN);
	if (v.entries.length === 0) {
		doc.font('body').fontSize(13).text('No run order yet.', MARGIN);
	} else {
		doc.moveDown(0.3);
		tableHead(doc);
		for (const e of v.entries) entryRow(doc, e);
	}
	if (doc.y > doc.page.height - MARGIN - 110) doc.addPage();
	doc.moveDown(1).font('bold').fontSize(13).fillColor(INK).text('Sound level and care', MARGIN);
	doc.font('body').fontSize(12).text(v.soundCaution, MARGIN, doc.y, { width });
	doc.moveDown(0.4).text(v.careNote, MARGIN, doc.y, { width });
	footers(doc, v, width);
	doc.end();
	return done;
}
