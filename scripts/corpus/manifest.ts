// The outside tempo corpus's manifest (built by scripts/corpus/build.ts, read by the benchmark
// and the tuning tool). Audio and manifest live outside the repository.
import { homedir } from 'node:os';
import { join } from 'node:path';

export interface CorpusEntry {
	/** File name under <corpus>/audio. */
	file: string;
	source: 'midi' | 'abc' | 'hydrogen' | 'lmms' | 'recorded';
	/** The piece it renders: every rendering of one piece is in the same half. */
	piece: string;
	/** The beat a dancer counts, per minute, from the piece's own tempo. */
	bpm: number;
	/** 3 (triple) or 4 (duple), or null where the signature changes or is neither. */
	meter: 3 | 4 | null;
	split: 'tune' | 'test';
}

export const corpusDir = () =>
	process.env.FLOORSET_CORPUS ?? join(homedir(), '.cache', 'floorset-corpus');
