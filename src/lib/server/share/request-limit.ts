import { SlidingWindowLimit } from '../sliding-window-limit';

// How many dance requests one evening takes, counted two ways. Per device (a cookie): 5 in 10
// minutes, plenty for a dancer, too few to flood the DJ's list. Per address: 60 in 10 minutes,
// because a whole hall on the venue's Wi-Fi shares one address, and a client that throws its
// cookie away each time still meets this ceiling. Our own judgement (common practice, no source).

export const REQUEST_WINDOW_MS = 10 * 60 * 1000;
export const REQUESTS_PER_DEVICE = 5;
export const REQUESTS_PER_ADDRESS = 60;

/** The cookie naming a device; random, it says nothing about the person. */
export const DEVICE_COOKIE = 'floorset-device';

const perDevice = new SlidingWindowLimit(REQUESTS_PER_DEVICE, REQUEST_WINDOW_MS);
const perAddress = new SlidingWindowLimit(REQUESTS_PER_ADDRESS, REQUEST_WINDOW_MS);

/** Counts one request; false when this device or this address has used up its window. */
export function takeRequest(
	eveningId: number,
	from: { device: string; address: string },
	now = Date.now()
): boolean {
	return (
		perDevice.take(`${eveningId}|${from.device}`, now) &&
		perAddress.take(`${eveningId}|${from.address}`, now)
	);
}
