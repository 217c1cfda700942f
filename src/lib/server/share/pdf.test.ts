import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { describe, expect, test } from 'vitest';
import { buildPdf } from './pdf';
import { SHEET } from '../testing/sheet';

// The PDF's text extracted with pdfjs-dist (Mozilla's general-purpose PDF reader, ISO 32000).
async function pdfText(bytes: Buffer): Promise<{ pages: number; text: string }> {
	const doc = await getDocument({ data: new Uint8Array(bytes), disableFontFace: true }).promise;
	const parts: string[] = [];
	for (let i = 1; i <= doc.numPages; i++) {
		const content = await (await doc.getPage(i)).getTextContent();
		for (const item of content.items) if ('str' in item) parts.push(item.str);
	}
	const pages = doc.numPages;
	await doc.destroy();
	return { pages, text: parts.join(' ').replace(/\s+/g, ' ') };
}

describe('PDF run sheet', () => {
	test('is a PDF whose text holds the evening, every entry and the sound caution', async () => {
		const bytes = await buildPdf(SHEET);
		expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
		const { text, pages } = await pdfText(bytes);
		expect(pages).toBe(1);
		expect(text).toContain('Thistlewick Barn Social');
		expect(text).toContain('Friday 11 December 2026, 19:00–23:00');
		expect(text).toContain('Copperlane Hall');
		expect(text).toContain('taught by Odile');
		expect(text).toContain('Teach: Pebble Lane Stroll (Beginner)');
		// Plain arithmetic: 120 × 0.90 = 108.
		expect(text).toContain('120 × 0.90 = 108');
		expect(text).toContain('Gorse, Gate & Gallop (Intermediate)');
		expect(text).toContain('Hayloft Lanterns · The Wrenhill Five');
		expect(text).toContain('Tea and water');
		expect(text).toContain('19:23');
		expect(text).toContain('3:07');
		// The caution cites the WHO standard (REFERENCES.md, Sound and safety).
		expect(text).toContain('100 dB LAeq over any 15 minutes');
		expect(text).toContain('Global standard for safe listening venues and events, 2022');
	});

	test('embeds the shipped Atkinson Hyperlegible TrueType, regular and bold', async () => {
		// A subset font's BaseFont is a six-letter tag, '+', and the PostScript name (ISO 32000-1,
		// 9.6.4); font dictionaries are plain objects, readable in the file as it is.
		const raw = (await buildPdf(SHEET)).toString('latin1');
		expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+AtkinsonHyperlegible-Regular/);
		expect(raw).toMatch(/\/BaseFont \/[A-Z]{6}\+AtkinsonHyperlegible-Bold/);
		expect(raw).toMatch(/\/FontFile2/); // TrueType font program (9.9)
	});

	test('a long run order flows onto more pages, each with its page number', async () => {
		const many = Array.from({ length: 80 }, (_, i) => ({
			...SHEET.entries[2],
			position: i + 1,
			danceName: `Invented Reel ${i + 1}`
		}));
		const { text, pages } = await pdfText(await buildPdf({ ...SHEET, entries: many }));
		expect(pages).toBeGreaterThan(2);
		expect(text).toContain(`page ${pages} of ${pages}`);
		expect(text).toContain('Invented Reel 1 ');
		expect(text).toContain('Invented Reel 80');
	});
});
