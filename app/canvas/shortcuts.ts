/** The editor's keyboard shortcuts, as the "?" list shows them (Ctrl stands for Cmd on a Mac). */
export interface Shortcut {
  readonly keys: readonly string[];
  readonly does: string;
}

export const SHORTCUTS: readonly { readonly group: string; readonly items: readonly Shortcut[] }[] = [
  {
    group: 'Selection',
    items: [
      { keys: ['Click'], does: 'select a chip or a wire' },
      { keys: ['Shift+Click'], does: 'add to the selection, or take away' },
      { keys: ['Shift+Drag'], does: 'select everything in a box' },
      { keys: ['Ctrl+A'], does: 'select every chip' },
      { keys: ['Esc'], does: 'clear the selection' },
    ],
  },
  {
    group: 'Editing',
    items: [
      { keys: ['Ctrl+C'], does: 'copy the selected chips and the nets among them' },
      { keys: ['Ctrl+V'], does: 'paste them, with fresh designators and net ids' },
      { keys: ['Ctrl+D'], does: 'duplicate the selected chips' },
      { keys: ['←', '→', '↑', '↓'], does: 'nudge the selected chips by 10' },
      { keys: ['Shift+Arrow'], does: 'nudge them by 40' },
      { keys: ['Delete', 'Backspace'], does: 'delete the selected chips and wires' },
      { keys: ['Ctrl+Z'], does: 'undo' },
      { keys: ['Ctrl+Shift+Z', 'Ctrl+Y'], does: 'redo' },
    ],
  },
  {
    group: 'View',
    items: [
      { keys: ['F'], does: 'fit the whole design in view' },
      { keys: ['Shift+F'], does: 'fit the selected chips (or net) in view' },
      { keys: ['Tab'], does: 'move between chips, wires and panels' },
      { keys: ['?'], does: 'show this list' },
    ],
  },
];

/** Grid step of a nudge, and the bigger one with Shift: React Flow's own steps for a focused chip (snap grid 10, ×4). */
export const NUDGE = 10;
export const NUDGE_BIG = 40;
