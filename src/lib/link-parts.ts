// Plain text split into words and web links, so a page can show a message's links as links
// without ever rendering its text as HTML. Only http and https addresses become links.

export type TextPart = { text: string; href?: string };

// A URL runs to the next space or angle bracket; closing punctuation after it is the sentence's.
const URL = /https?:\/\/[^\s<>"]+/g;
const TRAILING = /[.,;:!?)\]'’”]+$/;

export function linkParts(text: string): TextPart[] {
	const parts: TextPart[] = [];
	let at = 0;
	for (const m of text.matchAll(URL)) {
		const url = m[0].replace(TRAILING, '');
		const start = m.index ?? 0;
		if (start > at) parts.push({ text: text.slice(at, start) });
		let href: string | undefined;
		try {
			const parsed = new globalThis.URL(url);
			if (parsed.protocol === 'http:' || parsed.protocol === 'https:') href = parsed.href;
		} catch {
			href = undefined;
		}
		parts.push(href ? { text: url, href } : { text: url });
		at = start + url.length;
	}
	if (at < text.length) parts.push({ text: text.slice(at) });
	return parts;
}
