// Undo and redo of the run-order draft (issue 12, "Edits vanish").
import { expect, test } from 'vitest';
import { RunOrderDraft, type EntryData } from './draft.svelte';

const dances: EntryData[] = ['Alder Reel', 'Birch Stomp', 'Cedar Waltz'].map((danceName) => ({
	kind: 'dance',
	danceName,
	durationS: 180
}));
const draft = () =>
	new RunOrderDraft(
		dances,
		() => [],
		() => 15
	);
const names = (d: RunOrderDraft) => d.entries.map((e) => e.danceName ?? e.text);

test('each change is undone in turn, back to the loaded order, and redone', () => {
	const d = draft();
	expect(d.canUndo).toBe(false);
	d.move(0, 1);
	d.remove(2);
	expect(names(d)).toEqual(['Birch Stomp', 'Alder Reel']);
	d.undo();
	expect(names(d)).toEqual(['Birch Stomp', 'Alder Reel', 'Cedar Waltz']);
	d.undo();
	expect(names(d)).toEqual(['Alder Reel', 'Birch Stomp', 'Cedar Waltz']);
	// Back where it was loaded: nothing unsaved, nothing more to undo.
	expect(d.dirty).toBe(false);
	expect(d.canUndo).toBe(false);
	d.redo();
	d.redo();
	expect(names(d)).toEqual(['Birch Stomp', 'Alder Reel']);
	expect(d.dirty).toBe(true);
	expect(d.canRedo).toBe(false);
});

test('a new change after an undo drops what could be redone', () => {
	const d = draft();
	d.toggleLock(1);
	d.undo();
	expect(d.entries[1].locked).toBe(false);
	d.setRate(0, 0.9);
	expect(d.canRedo).toBe(false);
	d.undo();
	expect(d.entries[0].rate).toBe(1);
});

test('typing in one entry is one step; a save starts the history afresh', () => {
	const d = draft();
	d.insert(0, { kind: 'announcement', text: '' });
	for (const text of ['W', 'We', 'Wel', 'Welcome']) d.setText(0, text);
	d.undo();
	expect(names(d)[0]).toBe('');
	d.undo();
	expect(names(d)).toEqual(['Alder Reel', 'Birch Stomp', 'Cedar Waltz']);
	d.redo();
	d.replace(dances, false);
	expect(d.canUndo).toBe(false);
	expect(d.canRedo).toBe(false);
});
