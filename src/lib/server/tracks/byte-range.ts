// HTTP Range for the audio preview (RFC 9110 §14: "bytes=first-last", "bytes=first-",
// "bytes=-suffix"). One range is served; a list of ranges is answered with the first, which
// RFC 9110 allows (a server may ignore or coalesce ranges), and every media element asks for one.

export type RangeAnswer =
	{ kind: 'whole' } | { kind: 'part'; start: number; end: number } | { kind: 'unsatisfiable' };

export function parseRange(header: string | null, size: number): RangeAnswer {
	if (!header) return { kind: 'whole' };
	const m = /^\s*bytes\s*=\s*(.+)$/i.exec(header);
	// Other units are ignored, as RFC 9110 §14.2 says a server does with units it does not know.
	if (!m) return { kind: 'whole' };
	const first = m[1].split(',')[0].trim();
	const spec = /^(\d*)\s*-\s*(\d*)$/.exec(first);
	if (!spec || (spec[1] === '' && spec[2] === '')) return { kind: 'unsatisfiable' };
	if (size === 0) return { kind: 'unsatisfiable' };
	if (spec[1] === '') {
		const suffix = Number(spec[2]);
		if (suffix === 0) return { kind: 'unsatisfiable' };
		return { kind: 'part', start: Math.max(0, size - suffix), end: size - 1 };
	}
	const start = Number(spec[1]);
	const end = spec[2] === '' ? size - 1 : Math.min(Number(spec[2]), size - 1);
	if (start >= size || end < start) return { kind: 'unsatisfiable' };
	return { kind: 'part', start, end };
}
