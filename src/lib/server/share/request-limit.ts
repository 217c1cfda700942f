import { SlidingWindowLimit } from '../sliding-window-limit';

// How often one address may send requests for one evening: 5 in 10 minutes. Our own judgement
// (common practice, no source): plenty for a dancer, too few to flood the DJ's list.

export const REQUESTS_PER_WINDOW = 5;
export const REQUEST_WINDOW_MS = 10 * 60 * 1000;
export const requestLimit = new SlidingWindowLimit(REQUESTS_PER_WINDOW, REQUEST_WINDOW_MS);

export const requestKey = (eveningId: number, address: string) => `${eveningId}|${address}`;
