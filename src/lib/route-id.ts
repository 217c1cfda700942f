// Ids in URLs: positive whole numbers of at most 15 digits (always safe integers), so
// "/api/dances/1e3", "/api/dances/-1" or "/api/dances/007" match no route and answer 404.
// The route matcher (src/params/id.ts) and the one parser below share the rule.
export const ID_PATTERN = /^[1-9]\d{0,14}$/;

/** The id in a URL segment, or null when it is not one. */
export function idParam(text: string | undefined): number | null {
	return text && ID_PATTERN.test(text) ? Number(text) : null;
}
