// The editor's calls to the evenings API, with the answers it needs.
import type { EntryData } from './draft.svelte';

export interface PlanAnswer {
	entries: EntryData[];
	objective: { total: number; terms: Record<string, number> };
	unmet: string[];
	violations: string[];
	ms: number;
	stats?: { iterations: number; greedyTotal: number; seed: number };
}

export interface Suggestion {
	trackId: number;
	title: string;
	artist: string;
	bpm: number | null;
	durationS: number;
	score: number;
	verdict: string | null;
	rate: number;
	reasons: string[];
}

type Answer<T> = { ok: true; data: T } | { ok: false; status: number; error: string };

async function call<T>(url: string, init?: RequestInit): Promise<Answer<T>> {
	let res: Response;
	try {
		res = await fetch(url, {
			...init,
			headers: { 'content-type': 'application/json', accept: 'application/json' }
		});
	} catch {
		return {
			ok: false,
			status: 0,
			error: 'The server could not be reached. Check the connection.'
		};
	}
	const body = await res.json().catch(() => ({}));
	if (!res.ok) return { ok: false, status: res.status, error: body.error ?? `Error ${res.status}` };
	return { ok: true, data: body as T };
}

export const planEvening = (id: number, seed: number, entries: unknown[]) =>
	call<PlanAnswer>(`/api/evenings/${id}/plan`, {
		method: 'POST',
		body: JSON.stringify({ seed, entries })
	});

export const saveRunOrder = (id: number, version: number, entries: unknown[]) =>
	call<{ runOrderVersion: number; entries: EntryData[] }>(`/api/evenings/${id}/run-order`, {
		method: 'PUT',
		body: JSON.stringify({ version, entries })
	});

export const loadRunOrder = (id: number) =>
	call<{ runOrderVersion: number; entries: EntryData[] }>(`/api/evenings/${id}/run-order`);

export const suggestTracks = (id: number, danceId: number) =>
	call<{ items: Suggestion[] }>(`/api/evenings/${id}/suggestions?danceId=${danceId}`);
