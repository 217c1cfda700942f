// A track id from the URL: a positive integer, or nothing (the route answers 404).
export function trackId(param: string): number | null {
	if (!/^[1-9]\d{0,15}$/.test(param)) return null;
	const id = Number(param);
	return Number.isSafeInteger(id) ? id : null;
}
