// Two promises about rights, checked over the source tree:
// 1. every handler a server module exports (each load, action and endpoint method) calls a guard
//    helper in its own body (or says it is public);
// 2. every +server.ts route and method is listed in the role matrix (tests/route-matrix.ts).
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative, sep } from 'node:path';
import ts from 'typescript';
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

const GUARDS = new Set(['requireRight', 'requireUser', 'publicRoute']);
const HANDLER = /^(GET|POST|PUT|PATCH|DELETE|fallback|load)$/;

/** Whether `node` itself (not a helper it calls) calls one of the guard helpers. */
function callsGuard(node: ts.Node): boolean {
	if (ts.isCallExpression(node) && ts.isIdentifier(node.expression)) {
		if (GUARDS.has(node.expression.text)) return true;
	}
	return ts.forEachChild(node, callsGuard) ?? false;
}

/** Each handler a server module exports (GET…, load, every form action), parsed with the
 * TypeScript compiler, and whether its own body checks rights. */
function handlersOf(file: string): { name: string; guarded: boolean }[] {
	const source = ts.createSourceFile(
		file,
		readFileSync(file, 'utf8'),
		ts.ScriptTarget.Latest,
		true
	);
	const out: { name: string; guarded: boolean }[] = [];
	for (const statement of source.statements) {
		const exported = ts
			.getModifiers(statement as ts.HasModifiers)
			?.some((m) => m.kind === ts.SyntaxKind.ExportKeyword);
		if (!exported) continue;
		if (ts.isFunctionDeclaration(statement) && HANDLER.test(statement.name?.text ?? '')) {
			out.push({ name: statement.name!.text, guarded: callsGuard(statement) });
		}
		if (!ts.isVariableStatement(statement)) continue;
		for (const d of statement.declarationList.declarations) {
			const name = d.name.getText(source);
			let init = d.initializer;
			while (
				init &&
				(ts.isSatisfiesExpression(init) ||
					ts.isAsExpression(init) ||
					ts.isParenthesizedExpression(init))
			)
				init = init.expression;
			if (!init) continue;
			if (name === 'actions' && ts.isObjectLiteralExpression(init)) {
				for (const p of init.properties)
					out.push({ name: `action ${p.name?.getText(source)}`, guarded: callsGuard(p) });
			} else if (HANDLER.test(name)) out.push({ name, guarded: callsGuard(init) });
		}
	}
	return out;
}

describe('every handler checks rights itself', () => {
	for (const file of serverModules) {
		if (file.endsWith('+layout.server.ts')) continue; // layouts only pass who is signed in
		const handlers = handlersOf(file);
		test(`${relative(ROOT, file)} (${handlers.map((h) => h.name).join(', ')})`, () => {
			expect(handlers.length, 'a server module with no handler').toBeGreaterThan(0);
			for (const h of handlers) {
				expect(h.guarded, `${h.name} in ${relative(ROOT, file)} calls no guard helper`).toBe(true);
			}
		});
	}
});

test('the handler reader finds a handler that skips the guard', () => {
	// The check above, on a module written here: one guarded handler, one action without a guard.
	const dir = mkdtempSync(join(tmpdir(), 'floorset-coverage-'));
	const file = join(dir, '+page.server.ts');
	writeFileSync(
		file,
		`export const load = (event) => { requireRight(event, 'dances'); return {}; };
export const actions = { save: async (event) => ({ ok: true }) } satisfies Actions;`
	);
	expect(handlersOf(file)).toEqual([
		{ name: 'load', guarded: true },
		{ name: 'action save', guarded: false }
	]);
	rmSync(dir, { recursive: true });
});

describe('every API route is in the role matrix', () => {
	for (const file of endpoints) {
		const source = readFileSync(file, 'utf8');
		const exported = [...source.matchAll(/export const (GET|POST|PUT|PATCH|DELETE|fallback)\b/g)];
		// A fallback answers every method: the matrix lists the ones it calls.
		const methods = exported.flatMap((m) =>
			m[1] === 'fallback' ? (['GET', 'POST', 'DELETE'] as const) : [m[1]]
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
