/**
 * Each key command, pressed through the same entry the listener uses (`keyDown`), on the bench
 * of test parts: what it does to the design, the selection, the view and the dialogs, and when it
 * leaves the key alone (nothing selected; a canvas key pressed with the focus elsewhere).
 */
import { describe, expect, it } from 'vitest';
import { keyDown, KEY_COMMANDS, NUDGE, NUDGE_BIG, pressOf, type KeyContext } from '../../../app/keys/registry.ts';
import { connectPins } from '../../../app/store/commands/index.ts';
import { harness, type Harness } from '../harness.ts';

function setUp(): { h: Harness; ctx: KeyContext; view: string[] } {
  const h = harness();
  h.apply(connectPins('D.Y1', 'H.A'));
  const view: string[] = [];
  const ctx: KeyContext = {
    store: h.store,
    view: { fitAll: () => view.push('all'), focus: (t) => view.push(JSON.stringify(t)) },
    clipboard: null,
  };
  return { h, ctx, view };
}

const at = (h: Harness, id: string) => h.design.parts.find((p) => p.id === id)!.position;

describe('the key commands', () => {
  it.each([
    ['ArrowRight', NUDGE, 0],
    ['ArrowDown', 0, NUDGE],
    ['Shift+ArrowLeft', -NUDGE_BIG, 0],
    ['Shift+ArrowUp', 0, -NUDGE_BIG],
  ])('%s nudges the selected chip by (%i, %i), one undo step', (key, dx, dy) => {
    const { h, ctx } = setUp();
    const was = at(h, 'H') ?? { x: 0, y: 0 };
    h.store.getState().select({ parts: ['H'] });
    expect(keyDown(ctx, pressOf(key), true)).toBe(true);
    expect(at(h, 'H')).toEqual({ x: was.x + dx, y: was.y + dy });
    h.undo();
    expect(at(h, 'H') ?? { x: 0, y: 0 }).toEqual(was);
  });

  it('leaves the arrows alone with nothing selected, and away from the canvas', () => {
    const { h, ctx } = setUp();
    expect(keyDown(ctx, pressOf('ArrowRight'), true)).toBe(false);
    h.store.getState().select({ parts: ['H'] });
    const before = h.design;
    expect(keyDown(ctx, pressOf('ArrowRight'), false)).toBe(false);
    expect(h.design).toBe(before);
  });

  it('undoes, redoes (both keys) and deletes the selection (both keys)', () => {
    for (const [del, redo] of [
      ['Delete', 'Mod+Shift+Z'],
      ['Backspace', 'Mod+Y'],
    ] as const) {
      const { h, ctx } = setUp();
      h.store.getState().select({ parts: ['T'] });
      expect(keyDown(ctx, pressOf(del), false)).toBe(true);
      expect(h.design.parts.map((p) => p.id)).not.toContain('T');
      expect(keyDown(ctx, pressOf('Mod+Z', true), false)).toBe(true);
      expect(h.design.parts.map((p) => p.id)).toContain('T');
      expect(keyDown(ctx, pressOf(redo), false)).toBe(true);
      expect(h.design.parts.map((p) => p.id)).not.toContain('T');
    }
  });

  it('copies, pastes further down each time, and duplicates, selecting the copies', () => {
    const { h, ctx } = setUp();
    const s = () => h.store.getState();
    s().select({ parts: ['D', 'H'] });
    expect(keyDown(ctx, pressOf('Mod+V'), true)).toBe(false);
    expect(keyDown(ctx, pressOf('Mod+C'), true)).toBe(true);
    expect(s().notice?.text).toBe('Copied 2 parts and 1 net.');
    const count = h.design.parts.length;
    expect(keyDown(ctx, pressOf('Mod+V'), true)).toBe(true);
    expect(keyDown(ctx, pressOf('Mod+V'), true)).toBe(true);
    expect(h.design.parts.length).toBe(count + 4);
    expect(s().selection.parts).toHaveLength(2);
    s().select({ parts: ['T'] });
    expect(keyDown(ctx, pressOf('Mod+D'), true)).toBe(true);
    expect(h.design.parts.length).toBe(count + 5);
    expect(s().past.at(-1)?.name).toBe('Duplicate T');
  });

  it('selects every chip, and clears the selection with Escape (which is left alone when nothing is selected)', () => {
    const { h, ctx } = setUp();
    expect(keyDown(ctx, pressOf('Escape'), true)).toBe(false);
    expect(keyDown(ctx, pressOf('Mod+A'), true)).toBe(true);
    expect(h.store.getState().selection.parts).toEqual(h.design.parts.map((p) => p.id));
    expect(keyDown(ctx, pressOf('Escape'), true)).toBe(true);
    expect(h.store.getState().selection.parts).toEqual([]);
  });

  it('fits the design, or the selection, in view', () => {
    const { h, ctx, view } = setUp();
    expect(keyDown(ctx, pressOf('Shift+F'), true)).toBe(false);
    keyDown(ctx, pressOf('F'), true);
    h.store.getState().select({ parts: ['H'] });
    keyDown(ctx, pressOf('Shift+F'), true);
    expect(view).toEqual(['all', '{"parts":["H"]}']);
  });

  it.each([
    ['?', 'keys'],
    ['/', 'search'],
    ['Mod+K', 'search'],
  ])('%s opens the %s dialog', (key, kind) => {
    const { h, ctx } = setUp();
    expect(keyDown(ctx, pressOf(key), false)).toBe(true);
    expect(h.store.getState().dialog).toEqual({ kind });
  });

  it('keeps the canvas keys while a dialog is open', () => {
    const { h, ctx } = setUp();
    h.store.getState().openDialog({ kind: 'search' });
    expect(keyDown(ctx, pressOf('Mod+A'), true)).toBe(false);
    expect(h.store.getState().selection.parts).toEqual([]);
  });

  it('covers every command of the registry in this file', () => {
    // A command added to the registry needs a case here (and the property test draws it already).
    const tested = ['nudge', 'nudge-far', 'undo', 'redo', 'delete', 'copy', 'paste', 'duplicate', 'select-all'];
    tested.push('clear-selection', 'fit-all', 'fit-selection', 'shortcuts', 'search');
    expect(KEY_COMMANDS.map((c) => c.id).sort()).toEqual(tested.sort());
  });
});
