import type { ParamMatcher } from '@sveltejs/kit';
import { ID_PATTERN } from '$lib/route-id';

/** `[id=id]` in a route: only an id the app could have made (lib/route-id.ts). */
export const match = ((param: string) => ID_PATTERN.test(param)) satisfies ParamMatcher;
