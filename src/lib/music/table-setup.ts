// The music table's features and columns (TanStack Table v9: features and row models are
// registered explicitly, so only what the table uses is bundled). Kept outside the component
// so they are created once, as the adapter's documentation advises.
import { minutesSeconds } from '../format';
import {
	columnFilteringFeature,
	columnVisibilityFeature,
	createFilteredRowModel,
	createSortedRowModel,
	filterFn_equals,
	filterFn_includesString,
	filterFn_inNumberRange,
	globalFilteringFeature,
	rowSelectionFeature,
	rowSortingFeature,
	sortFn_alphanumeric,
	sortFn_basic,
	sortFn_text,
	tableFeatures,
	type ColumnDef
} from '@tanstack/svelte-table';
import { SOURCE_WORDS, type TrackJson } from './track-types';

/** Width of each column in the CSS grid, carried on the column's meta. */
export interface ColumnMetaInfo {
	size: string;
	numeric?: boolean;
}

export const features = tableFeatures({
	rowSortingFeature,
	columnFilteringFeature,
	globalFilteringFeature,
	columnVisibilityFeature,
	rowSelectionFeature,
	sortedRowModel: createSortedRowModel(),
	filteredRowModel: createFilteredRowModel(),
	sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic, text: sortFn_text },
	filterFns: {
		includesString: filterFn_includesString,
		inNumberRange: filterFn_inNumberRange,
		equals: filterFn_equals
	},
	columnMeta: {} as ColumnMetaInfo
});

export type Features = typeof features;
type Col = ColumnDef<Features, TrackJson>;

const text = (key: 'title' | 'artist' | 'album', header: string, size: string): Col => ({
	id: key,
	accessorFn: (t) => t[key],
	header,
	sortFn: 'text',
	filterFn: 'includesString',
	meta: { size }
});

const number = (
	id: string,
	header: string,
	get: (t: TrackJson) => number | undefined,
	size: string,
	format: (t: TrackJson) => string
): Col => ({
	id,
	accessorFn: get,
	header,
	sortFn: 'basic',
	sortUndefined: 'last',
	// Slowest and shortest first, the order a lesson plan reads in.
	sortDescFirst: false,
	enableGlobalFilter: false,
	cell: (c) => format(c.row.original),
	meta: { size, numeric: true }
});

export const columns: Col[] = [
	{
		id: 'select',
		header: 'Select',
		enableSorting: false,
		enableGlobalFilter: false,
		enableHiding: false,
		meta: { size: '3rem' }
	},
	text('title', 'Title', 'minmax(12rem, 2fr)'),
	text('artist', 'Artist', 'minmax(9rem, 1.3fr)'),
	text('album', 'Album', 'minmax(8rem, 1fr)'),
	{
		...number(
			'bpm',
			'Tempo',
			(t) => t.bpm ?? undefined,
			'13rem',
			(t) => String(t.bpm ?? '—')
		),
		filterFn: 'inNumberRange'
	},
	{
		...number(
			'meter',
			'Meter',
			(t) => t.meter,
			'5rem',
			(t) => `${t.meter}/4`
		),
		filterFn: 'equals'
	},
	number(
		'phraseBeats',
		'Phrase',
		(t) => t.phraseBeats,
		'5.5rem',
		(t) => `${t.phraseBeats}`
	),
	number(
		'introBeats',
		'Intro',
		(t) => t.introBeats,
		'5rem',
		(t) => `${t.introBeats}`
	),
	number(
		'durationS',
		'Length',
		(t) => t.durationS,
		'5.5rem',
		(t) => minutesSeconds(t.durationS)
	),
	number(
		'confidence',
		'Confidence',
		(t) => t.confidence ?? undefined,
		'7rem',
		(t) => (t.confidence === null ? '—' : `${Math.round(t.confidence * 100)} %`)
	),
	{
		id: 'bpmSource',
		accessorFn: (t) => t.bpmSource,
		header: 'Tempo from',
		sortFn: 'text',
		enableGlobalFilter: false,
		cell: (c) => SOURCE_WORDS[c.row.original.bpmSource],
		meta: { size: '7rem' }
	},
	{
		id: 'createdAt',
		accessorFn: (t) => t.createdAt,
		header: 'Added',
		sortFn: 'alphanumeric',
		enableGlobalFilter: false,
		cell: (c) => c.row.original.createdAt.slice(0, 10),
		meta: { size: '7rem' }
	}
];

/**
 * On a phone (under 640 px) the table keeps what a DJ looks a track up for: its title, tempo and
 * length, the title taking what room is left; the rest are on the track page.
 */
export const PHONE_COLUMNS = new Set(['select', 'title', 'bpm', 'durationS']);
export const PHONE_SIZES: Record<string, string> = {
	select: '2.75rem',
	title: 'minmax(0, 1fr)',
	bpm: 'minmax(4rem, auto)',
	durationS: '3.5rem'
};

/** Columns shown at first; the rest are a click away in the column chooser. */
export const INITIAL_HIDDEN = {
	album: false,
	introBeats: false,
	bpmSource: false,
	createdAt: false
};
