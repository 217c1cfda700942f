// Under load V8 lets the heap grow to several times what is live before a full collection (for
// a small heap its growing factor goes up to 4): the load benchmark saw a server with ~60 MB live
// reach 310 MB resident. A factor of 1.5 keeps it near what is live (peak 160 MB in the same run)
// for some 5-10 % more time spent collecting. Set at start rather than as a command-line flag,
// so it holds however the server is started and an unknown flag cannot stop a start (V8 ignores
// it here, where `node --flag` would refuse to run).
import { setFlagsFromString } from 'node:v8';

export function keepHeapNearLive() {
	setFlagsFromString('--heap-growing-percent=50');
}
