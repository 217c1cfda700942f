import { describe, expect, test } from 'vitest';
import { recomputeStarts, sectionAfterMove } from './timing';

// Worked examples by plain arithmetic.
describe('run-order start times', () => {
	test('back to back with a 15 s changeover', () => {
		// 0; 180 + 15 = 195; 195 + 200 + 15 = 410.
		const starts = recomputeStarts(
			[
				{ kind: 'dance', sectionId: 1, durationS: 180 },
				{ kind: 'dance', sectionId: 1, durationS: 200 },
				{ kind: 'dance', sectionId: 1, durationS: 150 }
			],
			[{ id: 1, startS: 0 }],
			15
		);
		expect(starts).toEqual([0, 195, 410]);
	});

	test('an entry never starts before its section', () => {
		// The first section ends early (0 + 600 = 600); the break section starts at 3000 s.
		const starts = recomputeStarts(
			[
				{ kind: 'teach', sectionId: 1, durationS: 600 },
				{ kind: 'break', sectionId: 2, durationS: 900 },
				{ kind: 'dance', sectionId: 2, durationS: 100 }
			],
			[
				{ id: 1, startS: 0 },
				{ id: 2, startS: 3000 }
			],
			10
		);
		expect(starts).toEqual([0, 3000, 3910]);
	});

	test('a moved entry joins the section of the entry before it', () => {
		const list = [{ sectionId: 1 }, { sectionId: 2 }, { sectionId: 2 }];
		expect(sectionAfterMove(list, 1)).toBe(1);
		expect(sectionAfterMove(list, 0)).toBe(2);
		expect(sectionAfterMove([{ sectionId: null }], 0)).toBeNull();
	});
});

describe('locked entries', () => {
	test('a locked entry keeps its start unless the entries before it run past it', () => {
		const list = [
			{ kind: 'dance' as const, sectionId: null, durationS: 100 },
			{ kind: 'dance' as const, sectionId: null, durationS: 100, locked: true, startS: 400 },
			{ kind: 'dance' as const, sectionId: null, durationS: 100 }
		];
		// 0; max(100 + 10, 400) = 400; 400 + 100 + 10 = 510.
		expect(recomputeStarts(list, [], 10)).toEqual([0, 400, 510]);
		// Unlocked, the pin is ignored: 0, 110, 220.
		expect(
			recomputeStarts(
				list.map((e) => ({ ...e, locked: false })),
				[],
				10
			)
		).toEqual([0, 110, 220]);
		// A longer first entry pushes the lock later: 0; 500 + 10 = 510.
		list[0].durationS = 500;
		expect(recomputeStarts(list, [], 10)[1]).toBe(510);
	});
});
