import { describe, expect, test } from 'vitest';
import { linkParts } from './link-parts';

// URL syntax as the WHATWG URL Standard parses it (the platform's own URL class); what counts as
// a sentence's punctuation after a link is common practice (no source).
describe('linkParts', () => {
	test('links in running text, the sentence’s full stop left outside', () => {
		expect(linkParts('Reset here: https://floorset.example/reset/abc. Thanks')).toEqual([
			{ text: 'Reset here: ' },
			{ text: 'https://floorset.example/reset/abc', href: 'https://floorset.example/reset/abc' },
			{ text: '. Thanks' }
		]);
	});

	test('text with no link is one part; other schemes stay text', () => {
		expect(linkParts('See you at seven.')).toEqual([{ text: 'See you at seven.' }]);
		const parts = linkParts('javascript:alert(1) and data:text/html,x');
		expect(parts.every((p) => p.href === undefined)).toBe(true);
		expect(parts.map((p) => p.text).join('')).toBe('javascript:alert(1) and data:text/html,x');
	});

	test('every part joined gives the text back, links and all', () => {
		const text = 'Two: http://a.example/x?y=1 (and https://b.example/)\nend';
		const parts = linkParts(text);
		expect(parts.map((p) => p.text).join('')).toBe(text);
		expect(parts.filter((p) => p.href).map((p) => p.href)).toEqual([
			'http://a.example/x?y=1',
			'https://b.example/'
		]);
	});
});
