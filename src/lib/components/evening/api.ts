// The editor's calls to the evenings API, with the answers it needs.
import { api, ApiError } from '../../api-client';
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

/** The editor reads every answer as a result rather than a throw: it shows refusals in place. */
async function call<T>(url: string, init?: { method: string; body: unknown }): Promise<Answer<T>> {
	try {
		return { ok: true, data: await api<T>(url, init) };
	} catch (e) {
		if (e instanceof ApiError) return { ok: false, status: e.status, error: e.message };
		throw e;
	}
}

export const planEvening = (id: number, seed: number, entries: unknown[]) =>
	call<PlanAnswer>(`/api/evenings/${id}/plan`, {
		method: 'POST',
		body: { seed, entries }
	});

export const saveRunOrder = (id: number, version: number, entries: unknown[]) =>
	call<{ runOrderVersion: number; entries: EntryData[] }>(`/api/evenings/${id}/run-order`, {
		method: 'PUT',
		body: { version, entries }
	});

export const loadRunOrder = (id: number) =>
	call<{ runOrderVersion: number; entries: EntryData[] }>(`/api/evenings/${id}/run-order`);

export const suggestTracks = (id: number, danceId: number) =>
	call<{ items: Suggestion[] }>(`/api/evenings/${id}/suggestions?danceId=${danceId}`);
