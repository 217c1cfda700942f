// Where uploaded files live. One small interface, so a hosted service could put the bytes in
// an S3-compatible store instead of the local disk. Keys are made by us (a SHA-256 and a fixed
// extension), never from a user's file name, so no path is ever built from user input.
import { randomUUID } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, open, readdir, rename, rm, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { Readable } from 'node:stream';
import { config } from './config';

export interface Storage {
	/** Writes atomically: the file appears whole under its key or not at all. */
	put(key: string, bytes: Uint8Array): Promise<void>;
	size(key: string): Promise<number | null>;
	/** A web stream of bytes [start, end] inclusive (the whole file without a range). */
	read(key: string, range?: { start: number; end: number }): ReadableStream<Uint8Array>;
	remove(key: string): Promise<void>;
	keys(prefix: string): Promise<string[]>;
	/** Removes half-written temporary files left by a crash; returns how many. */
	removeTemporary(): Promise<number>;
}

const KEY = /^(audio|sheets)\/[a-f0-9]{64}\.[a-z0-9]{2,5}$/;

export function assertKey(key: string) {
	if (!KEY.test(key)) throw new Error(`Not a storage key: ${key}`);
}

export function diskStorage(root: string): Storage {
	const base = resolve(root);
	const path = (key: string) => {
		assertKey(key);
		return join(base, key);
	};
	return {
		async put(key, bytes) {
			const target = path(key);
			await mkdir(join(target, '..'), { recursive: true });
			// Unique per write: two uploads of one file at the same moment must not share a temp file.
			const temp = `${target}.${randomUUID()}.part`;
			const handle = await open(temp, 'wx');
			try {
				await handle.writeFile(bytes);
				await handle.sync();
			} finally {
				await handle.close();
			}
			try {
				await rename(temp, target);
			} catch (e) {
				await rm(temp, { force: true });
				throw e;
			}
		},
		async size(key) {
			try {
				return (await stat(path(key))).size;
			} catch {
				return null;
			}
		},
		read(key, range) {
			const stream = createReadStream(path(key), range ?? {});
			return Readable.toWeb(stream) as ReadableStream<Uint8Array>;
		},
		async remove(key) {
			await rm(path(key), { force: true });
		},
		async keys(prefix) {
			try {
				const names = await readdir(join(base, prefix));
				return names.map((n) => `${prefix}/${n}`).filter((k) => KEY.test(k));
			} catch {
				return [];
			}
		},
		async removeTemporary() {
			let removed = 0;
			for (const prefix of ['audio', 'sheets']) {
				let names: string[] = [];
				try {
					names = await readdir(join(base, prefix));
				} catch {
					continue;
				}
				for (const name of names.filter((n) => n.endsWith('.part'))) {
					await rm(join(base, prefix, name), { force: true });
					removed++;
				}
			}
			return removed;
		}
	};
}

let instance: Storage | undefined;
export const storage = () => (instance ??= diskStorage(config().UPLOAD_DIR));
export const useStorage = (s: Storage | undefined) => (instance = s);
