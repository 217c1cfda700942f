// Runs src/lib/tempo/analyse-browser.ts in Debian's headless Chromium: builds the harness with
// Vite, serves it and the files to analyse from 127.0.0.1, and calls it through Playwright.
import { chromium, type Browser, type Page } from '@playwright/test';
import { createReadStream, mkdtempSync, rmSync, statSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { basename, extname, join, normalize } from 'node:path';
import { build } from 'vite';
import type { AnalyseOptions } from '../../src/lib/tempo/analyse-browser';

export interface AnalysisLine {
	file: string;
	ok: boolean;
	bpm?: number;
	rawBpm?: number;
	offsetS?: number;
	confidence?: number;
	alternative?: number | null;
	meter?: number;
	durationS?: number;
	title?: string | null;
	artist?: string | null;
	tagBpm?: number | null;
	ms?: number;
	candidates?: { bpm: number; score: number }[];
	timings?: Record<string, number>;
	error?: string;
}

// The types Chromium gives a dropped file by its extension (what the music page will see).
const TYPES: Record<string, string> = {
	'.mp3': 'audio/mpeg',
	'.wav': 'audio/wav',
	'.ogg': 'audio/ogg',
	'.flac': 'audio/flac',
	'.m4a': 'audio/mp4',
	'.aac': 'audio/aac',
	'.opus': 'audio/ogg'
};

const ARGS = [
	'--no-sandbox',
	'--disable-gpu',
	'--disable-background-networking',
	'--disable-component-update',
	'--disable-sync',
	'--no-first-run',
	'--autoplay-policy=no-user-gesture-required'
];

export class Analyser {
	private constructor(
		private readonly browser: Browser,
		private readonly page: Page,
		private readonly server: Server,
		private readonly files: string[],
		private readonly outDir: string
	) {}

	static async start(): Promise<Analyser> {
		const outDir = mkdtempSync(join(tmpdir(), 'floorset-analyse-'));
		await build({
			configFile: new URL('./vite.config.ts', import.meta.url).pathname,
			build: { outDir }
		});
		const files: string[] = [];
		const server = createServer((req, res) => {
			const url = new URL(req.url ?? '/', 'http://127.0.0.1');
			const m = /^\/files\/(\d+)$/.exec(url.pathname);
			// Only the files handed to analyse() are served, by index, never a path from the URL.
			const path = m ? files[Number(m[1])] : join(outDir, normalize(url.pathname));
			const safe = m || path.startsWith(outDir);
			const target = safe && url.pathname === '/' ? join(outDir, 'index.html') : path;
			try {
				if (!safe || !statSync(target).isFile()) throw new Error('not found');
			} catch {
				res.writeHead(404).end();
				return;
			}
			const type = target.endsWith('.js')
				? 'text/javascript'
				: target.endsWith('.html')
					? 'text/html'
					: 'application/octet-stream';
			res.writeHead(200, { 'content-type': type });
			createReadStream(target).pipe(res);
		});
		await new Promise<void>((ok) => server.listen(0, '127.0.0.1', ok));
		const { port } = server.address() as AddressInfo;
		const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ARGS });
		const page = await browser.newPage();
		await page.goto(`http://127.0.0.1:${port}/`);
		await page.waitForFunction(() => window.floorsetReady === true);
		return new Analyser(browser, page, server, files, outDir);
	}

	async analyse(path: string, options?: AnalyseOptions): Promise<AnalysisLine> {
		const file = basename(path);
		try {
			if (!statSync(path).isFile()) return { file: path, ok: false, error: 'Not a file.' };
		} catch {
			return { file: path, ok: false, error: 'No such file.' };
		}
		this.files.push(path);
		const url = `/files/${this.files.length - 1}`;
		const type = TYPES[extname(file).toLowerCase()] ?? '';
		const r = (await this.page.evaluate(({ u, n, t, o }) => window.floorsetAnalyse(u, n, t, o), {
			u: url,
			n: file,
			t: type,
			o: options
		})) as Record<string, never>;
		if (!r.ok) return { file: path, ok: false, error: r.error };
		const { tags, tempo } = r as unknown as {
			tags: {
				title: string | null;
				artist: string | null;
				durationS: number;
				tagBpm: number | null;
			};
			tempo: {
				bpm: number;
				rawBpm: number;
				offsetS: number;
				confidence: number;
				alternative: number | null;
				candidates: { bpm: number; score: number }[];
			};
		};
		return {
			file: path,
			ok: true,
			bpm: tempo.bpm,
			rawBpm: tempo.rawBpm,
			offsetS: tempo.offsetS,
			confidence: tempo.confidence,
			alternative: tempo.alternative,
			meter: r.meter,
			durationS: tags.durationS,
			title: tags.title,
			artist: tags.artist,
			tagBpm: tags.tagBpm,
			ms: r.ms,
			candidates: tempo.candidates,
			timings: r.timings
		};
	}

	async close(): Promise<void> {
		await this.browser.close();
		await new Promise<void>((ok) => this.server.close(() => ok()));
		rmSync(this.outDir, { recursive: true, force: true });
	}
}
