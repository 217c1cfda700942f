// Applies the saved light/dark choice before the page paints, so there is no flash.
(function () {
	try {
		var t = localStorage.getItem('floorset-theme');
		if (t === 'dark' || (!t && matchMedia('(prefers-color-scheme: dark)').matches))
			document.documentElement.classList.add('dark');
	} catch {
		// Storage may be blocked; the system preference then decides.
	}
})();
