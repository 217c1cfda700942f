// The cases of issue 13's finding 3, and the ones that must still pass (programs, our pages).
import { describe, expect, it } from 'vitest';
import { isCrossSiteWrite } from './same-origin';

const own = ['http://127.0.0.1:4173'];
const h = (o: Record<string, string>) => new Headers(o);

describe('isCrossSiteWrite', () => {
	it('refuses a body-less POST from another origin', () => {
		expect(isCrossSiteWrite('POST', h({ origin: 'http://evil.example' }), own)).toBe(true);
	});
	it('refuses DELETE and PATCH from another origin too', () => {
		expect(isCrossSiteWrite('DELETE', h({ origin: 'http://evil.example' }), own)).toBe(true);
		expect(isCrossSiteWrite('patch', h({ origin: 'null' }), own)).toBe(true);
	});
	it('refuses a write that says cross-site in Sec-Fetch-Site and has no Origin', () => {
		expect(isCrossSiteWrite('POST', h({ 'sec-fetch-site': 'cross-site' }), own)).toBe(true);
		expect(isCrossSiteWrite('POST', h({ 'sec-fetch-site': 'same-site' }), own)).toBe(true);
	});
	it('lets our own pages and programs without browser headers write', () => {
		expect(isCrossSiteWrite('POST', h({ origin: own[0] }), own)).toBe(false);
		expect(isCrossSiteWrite('POST', h({ 'sec-fetch-site': 'same-origin' }), own)).toBe(false);
		expect(isCrossSiteWrite('POST', h({}), own)).toBe(false);
	});
	it('never refuses a read', () => {
		expect(isCrossSiteWrite('GET', h({ origin: 'http://evil.example' }), own)).toBe(false);
	});
});
