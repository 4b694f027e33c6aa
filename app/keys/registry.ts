/**
 * The editor's keyboard commands, each once: its keys, what the shortcut list says it does, where
 * it acts and what it does. The one key listener (`useKeys`), the "?" list (`ShortcutsDialog`)
 * and the random-use property test all read this list, so a command added here is bound, shown
 * and exercised at once. No DOM and no React: what a command needs of the view comes in `KeyContext`.
 *
 * Keys are written `Mod+Shift+Z`: `Mod` is Ctrl (Cmd on a Mac), a letter is its key, named keys
 * are the browser's `KeyboardEvent.key` names. A punctuation key (`?`, `/`) is matched whatever
 * Shift says, since layouts differ on whether it needs Shift.
 */
import { copyParts, planPaste, type Clip } from '../store/clipboard.ts';
import { deleteSelection, insertParts, nudgeParts, parseWireId, type Pair } from '../store/commands/index.ts';
import type { EditorStore } from '../store/editorStore.ts';

/** Grid step of a nudge, and the bigger one with Shift: React Flow's own steps for a focused chip (snap grid 10, ×4). */
export const NUDGE = 10;
export const NUDGE_BIG = 40;

/** Where a paste lands: each paste of one copy a step further down and right, so that none hides another. */
const PASTE_STEP = 40;

/** What a key press carries that a command reads (a `KeyboardEvent` has all of it). */
export interface KeyPress {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

/** The view's side of the commands: the canvas gives React Flow's, a test gives its own. */
export interface KeyView {
  /** Fit the whole design into view. */
  fitAll(): void;
  /** Bring a net (its parts) or some parts into view. */
  focus(target: { net: string } | { parts: readonly string[] }): void;
}

export interface KeyContext {
  readonly store: EditorStore;
  readonly view: KeyView;
  /** The last copy and how many times it was pasted: kept by the listener between presses. */
  clipboard: { clip: Clip; pasted: number } | null;
}

/**
 * `anywhere`: wherever the focus is but in a field or a dialog. `canvas`: only while the canvas
 * (or nothing) has the focus, so that elsewhere the keys keep their usual meaning (copying a
 * finding's text, scrolling a list with the arrows).
 */
export type KeyScope = 'anywhere' | 'canvas';

export interface KeyCommand {
  readonly id: string;
  readonly group: 'Selection' | 'Editing' | 'View' | 'Find';
  /** What the shortcut list says it does. */
  readonly label: string;
  readonly keys: readonly string[];
  readonly scope: KeyScope;
  /** Act on the press; false when there is nothing to act on (the key then keeps its usual meaning). */
  run(ctx: KeyContext, press: KeyPress): boolean;
}

/** Gestures of the mouse and the browser's own keys: shown in the list, handled by React Flow or the browser. */
export const GESTURES: readonly {
  readonly group: KeyCommand['group'];
  readonly keys: readonly string[];
  readonly label: string;
}[] = [
  { group: 'Selection', keys: ['Click'], label: 'select a chip or a wire' },
  { group: 'Selection', keys: ['Shift+Click'], label: 'add to the selection, or take away' },
  { group: 'Selection', keys: ['Shift+Drag'], label: 'select everything in a box' },
  { group: 'View', keys: ['Tab'], label: 'move between chips, wires and panels' },
];

const DIRECTIONS: Readonly<Record<string, readonly [number, number]>> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, -1],
  ArrowDown: [0, 1],
};

function paste(ctx: KeyContext, clip: Clip, times: number, name?: string): void {
  const s = ctx.store.getState();
  const planned = planPaste(s.design, clip, { x: PASTE_STEP * times, y: PASTE_STEP * times });
  const out = s.apply(insertParts(planned.parts, planned.nets, name));
  if (out.ok) s.select({ parts: planned.parts.map((p) => p.id), wires: [], net: null });
}

function nudge(ctx: KeyContext, press: KeyPress, step: number): boolean {
  const s = ctx.store.getState();
  const dir = DIRECTIONS[press.key];
  if (dir === undefined || s.selection.parts.length === 0) return false;
  s.apply(nudgeParts(s.selection.parts, dir[0] * step, dir[1] * step));
  return true;
}

export const KEY_COMMANDS: readonly KeyCommand[] = [
  {
    id: 'select-all',
    group: 'Selection',
    label: 'select every chip',
    keys: ['Mod+A'],
    scope: 'canvas',
    run: ({ store }) => {
      const s = store.getState();
      s.select({ parts: s.design.parts.map((p) => p.id), wires: [], net: null });
      return true;
    },
  },
  {
    id: 'clear-selection',
    group: 'Selection',
    label: 'clear the selection',
    keys: ['Escape'],
    scope: 'anywhere',
    run: ({ store }) => {
      const s = store.getState();
      const sel = s.selection;
      if (sel.parts.length === 0 && sel.wires.length === 0 && sel.net === null) return false;
      s.select({ parts: [], wires: [], net: null });
      return true;
    },
  },
  {
    id: 'copy',
    group: 'Editing',
    label: 'copy the selected chips and the nets among them',
    keys: ['Mod+C'],
    scope: 'canvas',
    run: (ctx) => {
      const s = ctx.store.getState();
      const clip = copyParts(s.design, s.selection.parts);
      if (clip === undefined) return false;
      ctx.clipboard = { clip, pasted: 0 };
      const n = clip.parts.length;
      const m = clip.nets.length;
      s.notify({
        kind: 'done',
        text: `Copied ${n} ${n === 1 ? 'part' : 'parts'} and ${m} ${m === 1 ? 'net' : 'nets'}.`,
      });
      return true;
    },
  },
  {
    id: 'paste',
    group: 'Editing',
    label: 'paste them, with fresh designators and net ids',
    keys: ['Mod+V'],
    scope: 'canvas',
    run: (ctx) => {
      const held = ctx.clipboard;
      if (held === null) return false;
      held.pasted++;
      paste(ctx, held.clip, held.pasted);
      return true;
    },
  },
  {
    id: 'duplicate',
    group: 'Editing',
    label: 'duplicate the selected chips',
    keys: ['Mod+D'],
    scope: 'canvas',
    run: (ctx) => {
      const s = ctx.store.getState();
      const clip = copyParts(s.design, s.selection.parts);
      if (clip === undefined) return false;
      paste(ctx, clip, 1, `Duplicate ${clip.parts.length === 1 ? clip.parts[0]!.id : `${clip.parts.length} parts`}`);
      return true;
    },
  },
  {
    id: 'nudge',
    group: 'Editing',
    label: `nudge the selected chips by ${NUDGE}`,
    keys: ['ArrowLeft', 'ArrowRight', 'ArrowUp', 'ArrowDown'],
    scope: 'canvas',
    run: (ctx, press) => nudge(ctx, press, NUDGE),
  },
  {
    id: 'nudge-far',
    group: 'Editing',
    label: `nudge them by ${NUDGE_BIG}`,
    keys: ['Shift+ArrowLeft', 'Shift+ArrowRight', 'Shift+ArrowUp', 'Shift+ArrowDown'],
    scope: 'canvas',
    run: (ctx, press) => nudge(ctx, press, NUDGE_BIG),
  },
  {
    id: 'delete',
    group: 'Editing',
    label: 'delete the selected chips and wires',
    keys: ['Delete', 'Backspace'],
    scope: 'anywhere',
    run: ({ store }) => {
      const s = store.getState();
      const wires = s.selection.wires
        .map(parseWireId)
        .filter((w) => w !== undefined)
        .map((w): Pair => [w.a, w.b]);
      if (s.selection.parts.length === 0 && wires.length === 0) return false;
      s.apply(deleteSelection({ parts: s.selection.parts, wires }));
      return true;
    },
  },
  {
    id: 'undo',
    group: 'Editing',
    label: 'undo',
    keys: ['Mod+Z'],
    scope: 'anywhere',
    run: ({ store }) => {
      store.getState().undo();
      return true;
    },
  },
  {
    id: 'redo',
    group: 'Editing',
    label: 'redo',
    keys: ['Mod+Shift+Z', 'Mod+Y'],
    scope: 'anywhere',
    run: ({ store }) => {
      store.getState().redo();
      return true;
    },
  },
  {
    id: 'fit-all',
    group: 'View',
    label: 'fit the whole design in view',
    keys: ['F'],
    scope: 'anywhere',
    run: ({ view }) => {
      view.fitAll();
      return true;
    },
  },
  {
    id: 'fit-selection',
    group: 'View',
    label: 'fit the selected chips (or net) in view',
    keys: ['Shift+F'],
    scope: 'anywhere',
    run: ({ store, view }) => {
      const { parts, net } = store.getState().selection;
      if (parts.length > 0) view.focus({ parts });
      else if (net !== null) view.focus({ net });
      else return false;
      return true;
    },
  },
  {
    id: 'search',
    group: 'Find',
    label: 'find a part, pin, net or finding',
    keys: ['/', 'Mod+K'],
    scope: 'anywhere',
    run: ({ store }) => {
      store.getState().openDialog({ kind: 'search' });
      return true;
    },
  },
  {
    id: 'shortcuts',
    group: 'View',
    label: 'show this list',
    keys: ['?'],
    scope: 'anywhere',
    run: ({ store }) => {
      store.getState().openDialog({ kind: 'keys' });
      return true;
    },
  },
];

/** A key as written in the list, read: its key name and which modifiers it asks for (`shift` undefined: either). */
export interface Chord {
  readonly key: string;
  readonly mod: boolean;
  readonly shift: boolean | undefined;
  readonly alt: boolean;
}

/** A printable key that is not a letter or a digit: whether Shift is needed to type it depends on the layout. */
const isSymbol = (key: string) => key.length === 1 && !/[\p{L}\p{N}]/u.test(key);

/** Read `Mod+Shift+Z` into a chord. Throws on a modifier this file does not know (a typo must not bind nothing). */
export function parseChord(written: string): Chord {
  // The last part is the key, which may itself be "+" (never used: kept simple).
  const parts = written.split('+');
  const key = parts.pop()!;
  const mods = new Set(parts);
  for (const m of mods)
    if (m !== 'Mod' && m !== 'Shift' && m !== 'Alt') throw new Error(`Unknown modifier "${m}" in "${written}"`);
  if (key === '') throw new Error(`No key in "${written}"`);
  const name = key.length === 1 ? key.toLowerCase() : key;
  return {
    key: name,
    mod: mods.has('Mod'),
    shift: isSymbol(name) ? undefined : mods.has('Shift'),
    alt: mods.has('Alt'),
  };
}

/** One name per chord, whatever order or case it was written in: what the "bound twice" test compares. */
export function chordName(c: Chord): string {
  return `${c.mod ? 'Mod+' : ''}${c.alt ? 'Alt+' : ''}${c.shift === true ? 'Shift+' : ''}${c.key}`;
}

export function matches(c: Chord, press: KeyPress): boolean {
  const key = press.key.length === 1 ? press.key.toLowerCase() : press.key;
  return (
    key === c.key &&
    (press.ctrlKey || press.metaKey) === c.mod &&
    press.altKey === c.alt &&
    (c.shift === undefined || press.shiftKey === c.shift)
  );
}

const BOUND: readonly { readonly chord: Chord; readonly command: KeyCommand }[] = KEY_COMMANDS.flatMap((command) =>
  command.keys.map((k) => ({ chord: parseChord(k), command })),
);

/** The command a press is bound to, if any. */
export function commandFor(press: KeyPress): KeyCommand | undefined {
  return BOUND.find((b) => matches(b.chord, press))?.command;
}

/**
 * A key pressed with the focus on the canvas (or nowhere) or elsewhere, outside fields and
 * dialogs: run the command it is bound to, if its scope allows. True when the command acted
 * (the listener then keeps the browser from acting on the key too).
 */
export function keyDown(ctx: KeyContext, press: KeyPress, onCanvas: boolean): boolean {
  const command = commandFor(press);
  if (command === undefined) return false;
  if (command.scope === 'canvas' && (!onCanvas || ctx.store.getState().dialog !== null)) return false;
  return command.run(ctx, press);
}

/**
 * The key press a written key makes, as a browser would report it: what the tests send. A
 * symbol is sent with Shift, as on a US layout (its chord ignores Shift either way).
 */
export function pressOf(written: string, mac = false): KeyPress {
  const c = parseChord(written);
  const key = c.key.length === 1 && c.shift === true ? c.key.toUpperCase() : c.key;
  return {
    key,
    ctrlKey: c.mod && !mac,
    metaKey: c.mod && mac,
    shiftKey: c.shift ?? isSymbol(c.key),
    altKey: c.alt,
  };
}

const KEY_NAMES: Readonly<Record<string, string>> = {
  ArrowLeft: '←',
  ArrowRight: '→',
  ArrowUp: '↑',
  ArrowDown: '↓',
  Escape: 'Esc',
};

/** A key as the shortcut list shows it: `Mod+Shift+Z` → `Ctrl+Shift+Z`, `Shift+ArrowUp` → `Shift+↑`. */
export function keyLabel(written: string): string {
  const parts = written.split('+');
  const key = parts.pop()!;
  const shown = KEY_NAMES[key] ?? (key.length === 1 ? key.toUpperCase() : key);
  return [...parts.map((m) => (m === 'Mod' ? 'Ctrl' : m)), shown].join('+');
}

/** Read back a key as the list shows it (`Ctrl+Shift+↑`) into the written form: how the tests check the list against the keys. */
export function unlabel(shown: string): string {
  const parts = shown.split('+');
  const key = parts.pop()!;
  const named = Object.entries(KEY_NAMES).find(([, v]) => v === key)?.[0];
  return [...parts.map((m) => (m === 'Ctrl' ? 'Mod' : m)), named ?? key].join('+');
}

/** The shortcut list: per group, the commands' keys as shown, and the gestures. */
export function shortcutList(): { group: string; items: { keys: string[]; does: string; command?: string }[] }[] {
  const groups: KeyCommand['group'][] = ['Selection', 'Editing', 'View', 'Find'];
  return groups.map((group) => ({
    group,
    items: [
      ...GESTURES.filter((g) => g.group === group).map((g) => ({ keys: [...g.keys], does: g.label })),
      ...KEY_COMMANDS.filter((c) => c.group === group).map((c) => ({
        keys: c.keys.map(keyLabel),
        does: c.label,
        command: c.id,
      })),
    ],
  }));
}

/** A command's keys as the list shows them, for a button's tooltip: `/ or Ctrl+K`. */
export function keysOf(id: string): string {
  const command = KEY_COMMANDS.find((c) => c.id === id);
  if (command === undefined) throw new Error(`No key command "${id}"`);
  return command.keys.map(keyLabel).join(' or ');
}
