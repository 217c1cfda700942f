// Two promises about rights, checked over the source tree:
// 1. every server module (load, action or endpoint) calls the guard helper (or says it is public);
// 2. every +server.ts route and method is listed in the role matrix (tests/route-matrix.ts).
import { readFileSync, readdirSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { describe, expect, test } from 'vitest';
import { ACTIONS, PAGES } from '../../tests/page-matrix';
import { MATRIX } from '../../tests/route-matrix';

const ROOT = join(process.cwd(), 'src', 'routes');

function walk(dir: string): string[] {
	return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
		e.isDirectory() ? walk(join(dir, e.name)) : [join(dir, e.name)]
	);
}

const files = walk(ROOT);
const serverModules = files.filter((f) => /\+(page|layout)\.server\.ts$|\+server\.ts$/.test(f));
const endpoints = files.filter((f) => f.endsWith('+server.ts'));
const routeId = (file: string) =>
	'/' +
	relative(ROOT, file)
		.split(sep)
		.slice(0, -1)
		.filter((part) => !/^\(.*\)$/.test(part))
		.join('/');

describe('every server module checks rights', () => {
	for (const file of serverModules) {
		if (file.endsWith('+layout.server.ts')) continue; // layouts only pass who is signed in
		test(relative(ROOT, file), () => {
			expect(readFileSync(file, 'utf8')).toMatch(/\b(requireRight|requireUser|publicRoute)\(/);
		});
	}
});

describe('every API route is in the role matrix', () => {
	for (const file of endpoints) {
		const source = readFileSync(file, 'utf8');
		const methods = [...source.matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)].map(
			(m) => m[1]
		);
		test(`${routeId(file)} (${methods.join(', ')})`, () => {
			expect(methods.length).toBeGreaterThan(0);
			for (const method of methods) {
				const listed = MATRIX.some((r) => r.route === routeId(file) && r.method === method);
				expect(listed, `${method} ${routeId(file)} is missing from tests/route-matrix.ts`).toBe(
					true
				);
			}
		});
	}
});

describe('every page and form action is in the page matrix', () => {
	for (const file of files.filter((f) => f.endsWith('+page.svelte'))) {
		test(`page ${routeId(file)}`, () => {
			expect(
				PAGES.some((p) => p.route === routeId(file).replace(/^\/$/, '/')),
				`${routeId(file)} is missing from tests/page-matrix.ts`
			).toBe(true);
		});
	}
	for (const file of serverModules.filter((f) => f.endsWith('+page.server.ts'))) {
		const block = /export const actions = \{([\s\S]*?)\} satisfies Actions/.exec(
			readFileSync(file, 'utf8')
		)?.[1];
		if (!block) continue;
		const names = [...block.matchAll(/^\t(\w+):/gm)].map((m) => m[1]);
		test(`actions of ${routeId(file)} (${names.join(', ')})`, () => {
			expect(names.length).toBeGreaterThan(0);
			for (const name of names) {
				expect(
					ACTIONS.some((a) => a.route === routeId(file) && a.action === name),
					`?/${name} of ${routeId(file)} is missing from tests/page-matrix.ts`
				).toBe(true);
			}
		});
	}
});
