import { describe, expect, test } from 'vitest';
import { navFor } from './nav';

// The expected sections follow DESIGN.md's table of roles (what each role does and may change).
describe('navigation by role', () => {
	test('a dancer sees the catalogue, evenings and their own requests, nothing of the team', () => {
		expect(navFor(['dancer']).map((i) => i.label)).toEqual(['Dances', 'Evenings', 'Requests']);
	});
	test('a DJ sees music and requests', () => {
		expect(navFor(['dj']).map((i) => i.label)).toEqual(['Music', 'Dances', 'Evenings', 'Requests']);
	});
	test('an admin sees people and the outbox', () => {
		const labels = navFor(['admin']).map((i) => i.label);
		expect(labels).toContain('People');
		expect(labels).toContain('Outbox');
	});
	test('several roles combine', () => {
		const labels = navFor(['dancer', 'dj']).map((i) => i.label);
		expect(labels).toEqual(['Music', 'Dances', 'Evenings', 'Requests']);
	});
});
