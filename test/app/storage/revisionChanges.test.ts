/**
 * Each revision says what changed: the names of the commands (undos and redos too) applied since
 * the revision before, written with it and listed in the library's revision list.
 */
import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { changesOf, MAX_CHANGES, summarizeChanges } from '../../../app/storage/changes.ts';
import { addPowerState, nudgeParts, setTitle } from '../../../app/store/commands/index.ts';
import { dbName, tab } from './sessionSupport.ts';

describe('what changed, as a revision keeps it', () => {
  const cases: { name: string; names: string[]; kept: string[] }[] = [
    { name: 'nothing', names: [], kept: [] },
    { name: 'one command', names: ['Add a power state'], kept: ['Add a power state'] },
    {
      name: 'a run of one command once, with its count',
      names: ['Move U3', 'Move U3', 'Move U3', 'Rename U3', 'Move U3'],
      kept: ['Move U3 ×3', 'Rename U3', 'Move U3'],
    },
    {
      name: 'undo and redo as they came',
      names: ['Connect U1.A to U2.B', 'Undo Connect U1.A to U2.B', 'Redo Connect U1.A to U2.B'],
      kept: ['Connect U1.A to U2.B', 'Undo Connect U1.A to U2.B', 'Redo Connect U1.A to U2.B'],
    },
  ];
  it.each(cases)('$name', ({ names, kept }) => {
    expect(summarizeChanges(names)).toEqual(kept);
  });

  it(`keeps ${MAX_CHANGES} entries at most, the last counting the rest`, () => {
    const names = Array.from({ length: 100 }, (_, k) => `Move U${k}`);
    const kept = summarizeChanges(names);
    expect(kept).toHaveLength(MAX_CHANGES);
    expect(kept[MAX_CHANGES - 2]).toBe(`Move U${MAX_CHANGES - 2}`);
    expect(kept[MAX_CHANGES - 1]).toBe(`… and ${100 - (MAX_CHANGES - 1)} more`);
  });

  it('reads a stored list, and nothing from a record that has none or a damaged one', () => {
    expect(changesOf(['Add a power state'])).toEqual(['Add a power state']);
    for (const bad of [undefined, null, 'Move U1', [1, 2], [{ name: 'x' }]]) expect(changesOf(bad)).toBeUndefined();
  });
});

describe('a session writes what changed with each revision', () => {
  it('the commands since the last save go with the next revision, and only those', async () => {
    const session = await tab(dbName());
    const editor = session.editor;
    const id = session.openId!;
    editor.getState().apply(setTitle('Pump controller'));
    editor.getState().apply(addPowerState('Standby'));
    editor.getState().undo();
    editor.getState().redo();
    await session.flush();
    // A first start opens the example: it has parts to move.
    const first = editor.getState().design.parts[0]!.id;
    editor.getState().apply(setTitle('Pump controller, rev B'));
    editor.getState().apply(nudgeParts([first], 10, 0));
    editor.getState().apply(nudgeParts([first], 10, 0));
    await session.flush();
    const { revisions } = await session.library!.revisions(id);
    const [newest, middle] = revisions;
    expect(middle!.changes).toEqual([
      'Rename the design',
      'Add a power state',
      'Undo Add a power state',
      'Redo Add a power state',
    ]);
    expect(newest!.changes).toEqual(['Rename the design', `${nudgeParts([first], 10, 0).name} ×2`]);
  });
});
