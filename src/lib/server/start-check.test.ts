import { expect, test } from 'vitest';
import { applyEnvDefaults } from '../../../scripts/env';
import { parseBodyLimit, startProblems } from './start-check';

test('BODY_SIZE_LIMIT is read as adapter-node documents it (bytes, K, M, G, Infinity)', () => {
	// Source: the SvelteKit docs, adapter-node, "BODY_SIZE_LIMIT" (512K default; K, M, G suffixes).
	expect(parseBodyLimit('512K')).toBe(524_288);
	expect(parseBodyLimit('1M')).toBe(1_048_576);
	expect(parseBodyLimit('2g')).toBe(2 * 1024 ** 3);
	expect(parseBodyLimit('1000')).toBe(1000);
	expect(parseBodyLimit('Infinity')).toBe(Infinity);
	expect(parseBodyLimit('lots')).toBeNull();
});

test('a bare `node build` (no BODY_SIZE_LIMIT, no HOST) is refused with a reason', () => {
	// Issue 13, finding 13: adapter-node's 512 KB default broke every upload over it.
	const { fatal, warnings } = startProblems({});
	expect(fatal).toHaveLength(1);
	expect(fatal[0]).toMatch(/BODY_SIZE_LIMIT.*npm start/);
	expect(warnings[0]).toMatch(/every network address/);
});

test('a limit below MAX_UPLOAD_MB is refused; the defaults npm start applies pass', () => {
	expect(
		startProblems({ BODY_SIZE_LIMIT: '100M', MAX_UPLOAD_MB: '200', HOST: 'x' }).fatal
	).toHaveLength(1);
	expect(startProblems(applyEnvDefaults({}))).toEqual({ fatal: [], warnings: [] });
	expect(startProblems(applyEnvDefaults({ MAX_UPLOAD_MB: '2' }))).toEqual({
		fatal: [],
		warnings: []
	});
});
