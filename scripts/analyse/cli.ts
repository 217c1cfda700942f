// npm run analyse -- FILE…: one JSON line per file, from the browser's own analysis module.
// Exit status 1 when any file failed, 2 when none was given.
import { Analyser } from './browser';

const files = process.argv.slice(2).filter((a) => a !== '--');
if (files.length === 0) {
	console.error('usage: npm run analyse -- FILE…');
	process.exit(2);
}
const analyser = await Analyser.start();
let failed = 0;
try {
	for (const path of files) {
		const line = await analyser.analyse(path);
		if (!line.ok) failed++;
		const { candidates: _c, timings: _t, meter: _m, detected: _d, ...shown } = line;
		console.log(JSON.stringify(shown));
	}
} finally {
	await analyser.close();
}
process.exit(failed > 0 ? 1 : 0);
