// One rule for text people type, on every path (forms, JSON, CSV import). A single-line field
// (a name, a title, a venue) has no control characters at all, line breaks included: a CR/LF in a
// title could forge a line in an e-mail or a playlist. No field has Unicode's bidirectional
// embeddings, overrides or isolates (U+202A–E, U+2066–9, UAX #9), which can make text read in
// another order than it is stored. Multi-line fields (notes, messages) may keep line breaks and tabs.
import { z } from 'zod';

const CONTROL_OR_BIDI = /[\p{Cc}\u202a-\u202e\u2066-\u2069]/u;

export const isSingleLine = (s: string) => !CONTROL_OR_BIDI.test(s);
export const isPlainBlock = (s: string) => isSingleLine(s.replace(/[\n\r\t]/g, ''));

/** A single-line field: trimmed, at most `max` characters, no control or bidi-override characters. */
export const lineText = (max: number, what: string) =>
	z
		.string({ message: `Send the ${what} as text.` })
		.trim()
		.max(max, `Keep the ${what} under ${max} characters.`)
		.refine(isSingleLine, `Keep the ${what} on one line, without control characters.`);

/** A multi-line field: line breaks and tabs allowed, other control characters not. */
export const blockText = (max: number, what: string) =>
	z
		.string({ message: `Send the ${what} as text.` })
		.max(max, `Keep the ${what} under ${max.toLocaleString('en-GB')} characters.`)
		.refine(isPlainBlock, `Remove control characters from the ${what}.`);
