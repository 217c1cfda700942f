// About forty invented dances: line dances, with some partner and circle dances as a country night
// mixes them. Names are made up from invented places and words; tempo ranges follow the rhythm
// presets (see src/lib/tempo/rhythm-presets.ts for their sources).
import type { Formation, Level, Meter, PhraseEvent, Rhythm } from '../src/lib/domain';

export interface DemoDance {
	name: string;
	counts: number;
	walls: 1 | 2 | 4;
	level: Level;
	rhythm: Rhythm;
	meter: Meter;
	bpmMin: number;
	bpmMax: number;
	turn?: 'left' | 'right';
	/** Line unless said: about a quarter of a country night is partner dances. */
	formation?: Formation;
	wellKnown?: boolean;
	events?: PhraseEvent[];
	notes?: string;
}

const tag = (repetition: number, afterCount: number, lengthCounts: number): PhraseEvent => ({
	kind: 'tag',
	repetition,
	afterCount,
	lengthCounts
});
const restart = (repetition: number, afterCount: number): PhraseEvent => ({
	kind: 'restart',
	repetition,
	afterCount,
	lengthCounts: 0
});

export const DANCES: DemoDance[] = [
	{
		name: 'Brackenfold Stroll',
		counts: 32,
		walls: 4,
		level: 'absolute-beginner',
		rhythm: 'shuffle',
		meter: 4,
		bpmMin: 110,
		bpmMax: 128,
		turn: 'left',
		wellKnown: true
	},
	{
		name: 'Quillbrook Shuffle',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'shuffle',
		meter: 4,
		bpmMin: 112,
		bpmMax: 132,
		turn: 'right'
	},
	{
		name: 'Tansy Lane Two-Step',
		formation: 'partner',
		counts: 32,
		walls: 2,
		level: 'beginner',
		rhythm: 'two-step',
		meter: 4,
		bpmMin: 170,
		bpmMax: 196,
		turn: 'left'
	},
	{
		name: 'Marrowby Lantern Waltz',
		counts: 48,
		walls: 4,
		level: 'beginner',
		rhythm: 'waltz',
		meter: 3,
		bpmMin: 84,
		bpmMax: 100,
		turn: 'left',
		wellKnown: true
	},
	{
		name: 'Wrenmoor Cha',
		counts: 32,
		walls: 4,
		level: 'improver',
		rhythm: 'cha-cha',
		meter: 4,
		bpmMin: 100,
		bpmMax: 116,
		turn: 'right'
	},
	{
		name: 'Ninebark Ramble',
		counts: 64,
		walls: 2,
		level: 'intermediate',
		rhythm: 'west-coast-swing',
		meter: 4,
		bpmMin: 98,
		bpmMax: 116,
		turn: 'right',
		events: [restart(3, 32)]
	},
	{
		name: 'Copperwick Kick',
		counts: 32,
		walls: 4,
		level: 'absolute-beginner',
		rhythm: 'rock',
		meter: 4,
		bpmMin: 118,
		bpmMax: 136,
		turn: 'left',
		wellKnown: true
	},
	{
		name: 'Harrowgate Heel Tap',
		counts: 16,
		walls: 4,
		level: 'absolute-beginner',
		rhythm: 'two-step',
		meter: 4,
		bpmMin: 120,
		bpmMax: 140,
		turn: 'left'
	},
	{
		name: 'Saltmarsh Swing',
		counts: 32,
		walls: 4,
		level: 'improver',
		rhythm: 'east-coast-swing',
		meter: 4,
		bpmMin: 136,
		bpmMax: 158,
		turn: 'right'
	},
	{
		name: 'Hollin Ridge Polka',
		formation: 'partner',
		counts: 32,
		walls: 2,
		level: 'improver',
		rhythm: 'polka',
		meter: 4,
		bpmMin: 114,
		bpmMax: 130,
		turn: 'left'
	},
	{
		name: 'Fennick Nightfall',
		counts: 32,
		walls: 2,
		level: 'intermediate',
		rhythm: 'nightclub',
		meter: 4,
		bpmMin: 56,
		bpmMax: 76,
		turn: 'right'
	},
	{
		name: 'Oxeye Meadow Waltz',
		counts: 24,
		walls: 4,
		level: 'absolute-beginner',
		rhythm: 'waltz',
		meter: 3,
		bpmMin: 84,
		bpmMax: 102,
		turn: 'left'
	},
	{
		name: 'Dunmarrow Drift',
		formation: 'partner',
		counts: 48,
		walls: 2,
		level: 'intermediate',
		rhythm: 'west-coast-swing',
		meter: 4,
		bpmMin: 96,
		bpmMax: 112,
		turn: 'right',
		events: [tag(2, 48, 4)]
	},
	{
		name: 'Pebblecombe Boogie',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'rock',
		meter: 4,
		bpmMin: 124,
		bpmMax: 144,
		turn: 'right'
	},
	{
		name: 'Larkspur Lope',
		counts: 40,
		walls: 4,
		level: 'improver',
		rhythm: 'triple-two-step',
		meter: 4,
		bpmMin: 150,
		bpmMax: 176,
		turn: 'left'
	},
	{
		name: 'Thistledown Rumba',
		counts: 32,
		walls: 4,
		level: 'improver',
		rhythm: 'rumba',
		meter: 4,
		bpmMin: 96,
		bpmMax: 112,
		turn: 'left'
	},
	{
		name: 'Gorsehill Gallop',
		counts: 32,
		walls: 4,
		level: 'intermediate',
		rhythm: 'two-step',
		meter: 4,
		bpmMin: 176,
		bpmMax: 198,
		turn: 'right'
	},
	{
		name: 'Kestrel Court Cha',
		counts: 48,
		walls: 2,
		level: 'intermediate',
		rhythm: 'cha-cha',
		meter: 4,
		bpmMin: 98,
		bpmMax: 114,
		turn: 'right',
		events: [restart(4, 16)]
	},
	{
		name: 'Sorrelby Step',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'shuffle',
		meter: 4,
		bpmMin: 104,
		bpmMax: 124,
		turn: 'left',
		wellKnown: true
	},
	{
		name: 'Birchmere Turnaround',
		counts: 64,
		walls: 4,
		level: 'advanced',
		rhythm: 'west-coast-swing',
		meter: 4,
		bpmMin: 100,
		bpmMax: 118,
		turn: 'right',
		events: [tag(3, 64, 8), restart(5, 32)]
	},
	{
		name: 'Moth Lantern Waltz',
		formation: 'partner',
		counts: 48,
		walls: 2,
		level: 'intermediate',
		rhythm: 'waltz',
		meter: 3,
		bpmMin: 80,
		bpmMax: 96,
		turn: 'right'
	},
	{
		name: 'Ashgrove Amble',
		formation: 'circle',
		counts: 32,
		walls: 1,
		level: 'absolute-beginner',
		rhythm: 'shuffle',
		meter: 4,
		bpmMin: 100,
		bpmMax: 120
	},
	{
		name: 'Wickerbridge Wobble',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'east-coast-swing',
		meter: 4,
		bpmMin: 130,
		bpmMax: 152,
		turn: 'left'
	},
	{
		name: 'Cinderfield Stomp',
		counts: 48,
		walls: 4,
		level: 'advanced',
		rhythm: 'two-step',
		meter: 4,
		bpmMin: 180,
		bpmMax: 198,
		turn: 'right',
		events: [tag(2, 48, 2)]
	},
	{
		name: 'Rookhaven Rumba',
		counts: 40,
		walls: 2,
		level: 'advanced',
		rhythm: 'rumba',
		meter: 4,
		bpmMin: 94,
		bpmMax: 108,
		turn: 'left'
	},
	{
		name: 'Sedgewater Slide',
		formation: 'partner',
		counts: 32,
		walls: 2,
		level: 'improver',
		rhythm: 'nightclub',
		meter: 4,
		bpmMin: 60,
		bpmMax: 78,
		turn: 'left'
	},
	{
		name: 'Fallowfield Fling',
		counts: 32,
		walls: 4,
		level: 'improver',
		rhythm: 'polka',
		meter: 4,
		bpmMin: 116,
		bpmMax: 132,
		turn: 'right'
	},
	{
		name: 'Tumbleweir Twirl',
		counts: 48,
		walls: 4,
		level: 'intermediate',
		rhythm: 'triple-two-step',
		meter: 4,
		bpmMin: 150,
		bpmMax: 172,
		turn: 'right'
	},
	{
		name: 'Hazelgarth Hustle',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'rock',
		meter: 4,
		bpmMin: 120,
		bpmMax: 140,
		turn: 'left'
	},
	{
		name: 'Pennywhistle Promenade',
		formation: 'circle',
		counts: 16,
		walls: 2,
		level: 'absolute-beginner',
		rhythm: 'polka',
		meter: 4,
		bpmMin: 112,
		bpmMax: 130
	},
	{
		name: 'Starling Row Waltz',
		counts: 36,
		walls: 4,
		level: 'improver',
		rhythm: 'waltz',
		meter: 3,
		bpmMin: 84,
		bpmMax: 98,
		turn: 'left'
	},
	{
		name: 'Blackthorn Breakaway',
		counts: 64,
		walls: 2,
		level: 'advanced',
		rhythm: 'east-coast-swing',
		meter: 4,
		bpmMin: 138,
		bpmMax: 156,
		turn: 'right',
		events: [restart(2, 32)]
	},
	{
		name: 'Cobbler’s Yard Cha',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'cha-cha',
		meter: 4,
		bpmMin: 100,
		bpmMax: 118,
		turn: 'left'
	},
	{
		name: 'Milldam Sway',
		formation: 'partner',
		counts: 32,
		walls: 2,
		level: 'beginner',
		rhythm: 'nightclub',
		meter: 4,
		bpmMin: 58,
		bpmMax: 74,
		turn: 'right'
	},
	{
		name: 'Wrenfield Reel',
		counts: 32,
		walls: 4,
		level: 'improver',
		rhythm: 'two-step',
		meter: 4,
		bpmMin: 160,
		bpmMax: 188,
		turn: 'left'
	},
	{
		name: 'Foxglove Crossing',
		counts: 48,
		walls: 4,
		level: 'intermediate',
		rhythm: 'rumba',
		meter: 4,
		bpmMin: 98,
		bpmMax: 112,
		turn: 'right'
	},
	{
		name: 'Bramblegate Bounce',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'east-coast-swing',
		meter: 4,
		bpmMin: 134,
		bpmMax: 154,
		turn: 'right'
	},
	{
		name: 'Lanternlight Finale',
		counts: 32,
		walls: 4,
		level: 'beginner',
		rhythm: 'shuffle',
		meter: 4,
		bpmMin: 108,
		bpmMax: 126,
		turn: 'left',
		wellKnown: true
	},
	{
		name: 'Hearthstone Hitch',
		formation: 'partner',
		counts: 40,
		walls: 2,
		level: 'advanced',
		rhythm: 'triple-two-step',
		meter: 4,
		bpmMin: 156,
		bpmMax: 178,
		turn: 'left',
		events: [tag(3, 40, 4)]
	},
	{
		name: 'Willowmere Waltz',
		formation: 'partner',
		counts: 48,
		walls: 1,
		level: 'advanced',
		rhythm: 'waltz',
		meter: 3,
		bpmMin: 86,
		bpmMax: 100
	}
];

/** A demo dance as the columns of its row (shared by the seed and the server's test fixtures). */
export const danceValues = (d: DemoDance) => ({
	name: d.name,
	counts: d.counts,
	walls: d.walls,
	level: d.level,
	rhythm: d.rhythm,
	meter: d.meter,
	bpmMin: d.bpmMin,
	bpmMax: d.bpmMax,
	turn: d.turn ?? null,
	formation: d.formation ?? 'line',
	wellKnown: d.wellKnown ?? false,
	events: d.events ?? [],
	notes: d.notes ?? ''
});
