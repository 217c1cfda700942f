// The page the analysis scripts drive: the browser module itself, exposed to page.evaluate.
import { analyseFile, type AnalyseOptions } from '../../../src/lib/tempo/analyse-browser';

declare global {
	interface Window {
		floorsetAnalyse: (
			url: string,
			name: string,
			type: string,
			options?: AnalyseOptions
		) => Promise<unknown>;
		floorsetReady: boolean;
	}
}

window.floorsetAnalyse = async (url, name, type, options) => {
	const blob = await (await fetch(url)).blob();
	// As a dropped file: a File with the name and the type the browser gives its extension.
	const file = new File([blob], name, { type });
	try {
		return { ok: true, ...(await analyseFile(file, options)) };
	} catch (e) {
		return { ok: false, error: e instanceof Error ? e.message : String(e) };
	}
};
window.floorsetReady = true;
