// Route ids: positive whole numbers only, so "/api/dances/1e3" or "/api/dances/-1" is a 404.
export function idParam(text: string | undefined): number | null {
	if (!text || !/^[1-9]\d{0,15}$/.test(text)) return null;
	const n = Number(text);
	return Number.isSafeInteger(n) ? n : null;
}
