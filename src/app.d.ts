import type { SessionUser } from '$lib/server/users';

declare global {
	namespace App {
		interface Error {
			message: string;
			/** The same words for API clients, which read `error`. */
			error?: string;
		}
		interface Locals {
			user: SessionUser | null;
		}
		interface PageData {
			user?: SessionUser | null;
		}
	}
}

export {};
