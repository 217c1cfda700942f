// Whether this page's scripts have taken over the server's HTML. The root layout sets it once,
// when it mounts. A form that works only through script keeps its button disabled until then:
// clicked earlier, the browser would send it its own way, a GET with the fields in the address.
export const hydration = $state({ done: false });

/** Called by the root layout once mounted; also marks <html data-hydrated> for browser tests. */
export function markHydrated() {
	hydration.done = true;
	document.documentElement.setAttribute('data-hydrated', '');
}
