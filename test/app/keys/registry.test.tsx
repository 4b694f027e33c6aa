/**
 * The keyboard registry: no key bound twice, and the shortcut list the user reads (rendered as
 * the "?" dialog renders it) names exactly the keys the listener acts on, each for the command
 * it describes. Keys are our own choice; what is checked is that list and handlers agree.
 */
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { doubleBound } from '../../../app/keys/bindings.ts';
import {
  chordName,
  commandFor,
  GESTURES,
  KEY_COMMANDS,
  matches,
  parseChord,
  pressOf,
  unlabel,
} from '../../../app/keys/registry.ts';
import { ShortcutsDialog } from '../../../app/panels/ShortcutsDialog.tsx';
import { EditorProvider } from '../../../app/store/EditorProvider.tsx';
import { createEditorStore } from '../../../app/store/editorStore.ts';

/** The rows of the rendered list: the command a row is for (if a key command), its keys as shown, its text. */
function renderedRows(): { command: string | undefined; keys: string[]; does: string }[] {
  const store = createEditorStore(exampleDesign());
  const html = renderToStaticMarkup(
    <EditorProvider store={store}>
      <ShortcutsDialog />
    </EditorProvider>,
  );
  const rows = [...html.matchAll(/<div class="rc-keys-row"([^>]*)>(.*?)<\/div>/g)];
  return rows.map((m) => ({
    command: /data-command="([^"]+)"/.exec(m[1]!)?.[1],
    keys: [...m[2]!.matchAll(/<kbd>(.*?)<\/kbd>/g)].map((k) => k[1]!.replace(/&amp;/g, '&')),
    does: /<dd>(.*?)<\/dd>/.exec(m[2]!)?.[1] ?? '',
  }));
}

describe('the key registry', () => {
  it('binds no key twice, nor a key a gesture uses', () => {
    expect(doubleBound(KEY_COMMANDS, GESTURES)).toEqual([]);
  });

  it.each([
    // A key written in another case is the same key.
    [
      [
        { id: 'a', keys: ['F'] },
        { id: 'b', keys: ['f'] },
      ],
      ['f: a, b'],
    ],
    // Shift is not part of a symbol's chord: "?" and "Shift+?" are one key.
    [
      [
        { id: 'a', keys: ['?'] },
        { id: 'b', keys: ['Shift+?'] },
      ],
      ['?: a, b'],
    ],
    // The order of the modifiers does not make another key.
    [
      [
        { id: 'a', keys: ['Mod+Shift+Z'] },
        { id: 'b', keys: ['Shift+Mod+Z'] },
      ],
      ['Mod+Shift+z: a, b'],
    ],
    // One command listing a key twice.
    [[{ id: 'a', keys: ['Delete', 'Delete'] }], ['Delete: a, a']],
    // Different modifiers are different keys.
    [
      [
        { id: 'a', keys: ['Mod+Z'] },
        { id: 'b', keys: ['Mod+Shift+Z'] },
        { id: 'c', keys: ['Z'] },
      ],
      [],
    ],
  ])('finds a key bound twice in %j', (commands, expected) => {
    expect(doubleBound(commands)).toEqual(expected);
  });

  it('refuses a modifier it does not know, so that a typo cannot bind nothing', () => {
    expect(() => parseChord('Ctl+Z')).toThrow(/Unknown modifier/);
  });

  it('shows every command, and every one of its keys, in the list', () => {
    const rows = renderedRows();
    for (const c of KEY_COMMANDS) {
      const row = rows.find((r) => r.command === c.id);
      expect(row?.does, c.id).toBe(c.label);
      expect(
        row?.keys.map(unlabel).map((k) => chordName(parseChord(k))),
        c.id,
      ).toEqual(c.keys.map((k) => chordName(parseChord(k))));
    }
  });

  it('acts, on each key the list shows, with the command the row describes (Ctrl, and Cmd on a Mac)', () => {
    const rows = renderedRows().filter((r) => r.command !== undefined);
    expect(rows.length).toBe(KEY_COMMANDS.length);
    for (const row of rows)
      for (const shown of row.keys)
        for (const mac of [false, true]) expect(commandFor(pressOf(unlabel(shown), mac))?.id, shown).toBe(row.command);
  });

  it('binds no command to a gesture the list shows (those are React Flow’s or the browser’s)', () => {
    const gestures = renderedRows().filter((r) => r.command === undefined);
    expect(gestures.map((g) => g.does).sort()).toEqual(GESTURES.map((g) => g.label).sort());
    expect(commandFor(pressOf('Tab'))).toBeUndefined();
  });

  it.each([
    // Shift+letter reaches the page as the capital letter.
    ['Shift+F', { key: 'F', shiftKey: true }, true],
    ['F', { key: 'F', shiftKey: true }, false],
    ['F', { key: 'f' }, true],
    // A symbol typed with Shift on one layout and without on another.
    ['?', { key: '?', shiftKey: true }, true],
    ['/', { key: '/' }, true],
    ['/', { key: '/', shiftKey: true }, true],
    // Ctrl and Cmd both stand for Mod; Alt is never ignored.
    ['Mod+Z', { key: 'z', ctrlKey: true }, true],
    ['Mod+Z', { key: 'z', metaKey: true }, true],
    ['Mod+Z', { key: 'z', ctrlKey: true, altKey: true }, false],
    ['Mod+Z', { key: 'z' }, false],
    ['Mod+Shift+Z', { key: 'Z', ctrlKey: true, shiftKey: true }, true],
    ['Shift+ArrowUp', { key: 'ArrowUp', shiftKey: true }, true],
    ['ArrowUp', { key: 'ArrowUp', shiftKey: true }, false],
  ])('%s matches %j: %s', (written, press, expected) => {
    const full = { ctrlKey: false, metaKey: false, shiftKey: false, altKey: false, ...press };
    expect(matches(parseChord(written), full)).toBe(expected);
  });
});
