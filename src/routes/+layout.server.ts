import type { LayoutServerLoad } from './$types';

// Every page needs to know who is signed in, to draw the navigation; the pages check rights.
export const load = (({ locals }) => ({ user: locals.user })) satisfies LayoutServerLoad;
