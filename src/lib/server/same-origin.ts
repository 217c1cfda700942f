// Cross-site writes: SvelteKit's own origin check covers form content types only, so a POST
// with no body (publish, delete) from another site would go through with the user's cookie.
// Browsers send Origin on every cross-site non-GET request, and Sec-Fetch-Site where they send
// no Origin (Fetch Metadata, W3C); a program with neither is not a browser riding a session.

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Whether a request must be refused as a write from another site. */
export function isCrossSiteWrite(
	method: string,
	headers: { get(name: string): string | null },
	ownOrigins: string[]
): boolean {
	if (SAFE.has(method.toUpperCase())) return false;
	const origin = headers.get('origin');
	if (origin !== null) return !ownOrigins.includes(origin);
	const site = headers.get('sec-fetch-site');
	return site !== null && site !== 'same-origin' && site !== 'none';
}
