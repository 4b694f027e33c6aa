import 'fake-indexeddb/auto';
import { describe, expect, it, vi } from 'vitest';
import { Session } from '../../../app/session/session.ts';
import { RailcrossDb } from '../../../app/storage/db.ts';
import { Library } from '../../../app/storage/library.ts';
import { setTitle } from '../../../app/store/commands/index.ts';
import { dbName, tab } from './sessionSupport.ts';

/** Edit the title in one tab and wait until it is stored. */
async function retitle(session: Session, title: string): Promise<void> {
  session.editor.getState().apply(setTitle(title));
  await session.flush();
}

async function twoTabs() {
  const name = dbName();
  const a = await tab(name);
  const b = await tab(name);
  expect(b.openId).toBe(a.openId);
  return { a, b };
}

describe('two tabs on one design', () => {
  it('a save in one tab makes the other say so; nothing is written over either', async () => {
    const { a, b } = await twoTabs();
    await retitle(a, 'Edited in A');
    await vi.waitFor(() => expect(b.state.getState().conflict).toMatchObject({ kind: 'changed', rev: 2 }));

    // B edits anyway: its save is held, A's revision stays the newest.
    await retitle(b, 'Edited in B');
    expect(b.state.getState().open.saver.status.state).toBe('failed');
    const opened = await a.library!.open(a.openId!);
    expect(opened.ok && [opened.design.title, opened.record.rev]).toEqual(['Edited in A', 2]);
  });

  it('the save itself refuses a stale revision even when no message arrived', async () => {
    const name = dbName();
    const a = await tab(name);
    // B has no channel to other tabs: only the revision check inside the save protects A's work.
    const library = new Library(new RailcrossDb(name));
    const opened0 = await library.open(a.openId!);
    if (!opened0.ok) throw new Error('not opened');
    const b = new Session(library, null, { id: a.openId, rev: opened0.record.rev, design: opened0.design });
    await retitle(a, 'Edited in A');
    await retitle(b, 'Edited in B');
    expect(b.state.getState().conflict).toMatchObject({ kind: 'changed', rev: 2 });
    const opened = await a.library!.open(a.openId!);
    expect(opened.ok && opened.design.title).toBe('Edited in A');
    b.close();
    library.db.close();
  });

  it.each([
    {
      choice: 'reload' as const,
      expected: { title: 'Edited in A', sameDesign: true, designs: ['Edited in A'] },
    },
    {
      choice: 'copy' as const,
      expected: { title: 'Edited in B (copy)', sameDesign: false, designs: ['Edited in B (copy)', 'Edited in A'] },
    },
  ])('resolving with "$choice"', async ({ choice, expected }) => {
    const { a, b } = await twoTabs();
    const id = a.openId;
    await retitle(a, 'Edited in A');
    await retitle(b, 'Edited in B');
    await b.resolveConflict(choice);
    await b.flush();
    expect(b.state.getState().conflict).toBeNull();
    expect(b.editor.getState().design.title).toBe(expected.title);
    expect(b.openId === id).toBe(expected.sameDesign);
    const { designs } = await b.library!.list();
    expect(designs.map((d) => d.title).sort()).toEqual([...expected.designs].sort());
  });

  it('loading the other version is undoable, and the undo is saved as a new revision on top', async () => {
    const { a, b } = await twoTabs();
    await retitle(a, 'Edited in A');
    await retitle(b, 'Edited in B');
    await b.resolveConflict('reload');
    b.editor.getState().undo();
    expect(b.editor.getState().design.title).toBe('Edited in B');
    await b.flush();
    const opened = await b.library!.open(b.openId!);
    expect(opened.ok && [opened.design.title, opened.record.rev]).toEqual(['Edited in B', 3]);
  });

  it('a design deleted in another tab: restore it and the held edit is saved', async () => {
    const { a, b } = await twoTabs();
    await a.remove(a.openId!);
    await vi.waitFor(() => expect(b.state.getState().conflict).toEqual({ kind: 'deleted', restorable: true }));
    await retitle(b, 'Kept in B');
    await b.resolveConflict('restore');
    await b.flush();
    const opened = await b.library!.open(b.openId!);
    expect(opened.ok && [opened.design.title, opened.record.deletedAt]).toEqual(['Kept in B', null]);
  });
});
