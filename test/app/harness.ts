/**
 * A small harness for headless editor tests: create an editor, run commands, undo, and read
 * what the canvas and the findings panel would show.
 */
import { createEditorStore, type EditorStore, type Outcome } from '../../app/store/editorStore.ts';
import type { Command } from '../../app/store/commands/index.ts';
import type { Design, Net } from '../../rules/model/schema.ts';
import { bidir, design, input, output, part, rail1v8, rail3v3, rail5v0 } from '../support/build.ts';

export interface Harness {
  readonly store: EditorStore;
  readonly design: Design;
  apply(command: Command): Outcome;
  undo(): boolean;
  redo(): boolean;
  /** The net holding a pin, if any. */
  netOf(pin: string): Net | undefined;
  /** Net ids with their pins, in design order: what most expectations compare. */
  nets(): { id: string; pins: string[] }[];
  /** The wire status of a net in the chosen power state. */
  severity(net: string): string | undefined;
}

export function harness(start: Design = bench()): Harness {
  const store = createEditorStore(start);
  return {
    store,
    get design() {
      return store.getState().design;
    },
    apply: (command) => store.getState().apply(command),
    undo: () => store.getState().undo(),
    redo: () => store.getState().redo(),
    netOf: (pin) => store.getState().design.nets.find((n) => n.pins.includes(pin)),
    nets: () => store.getState().design.nets.map((n) => ({ id: n.id, pins: [...n.pins] })),
    severity: (net) => store.getState().netStatus.get(net)?.severity,
  };
}

/**
 * A bench of parts with no nets: D, a 3.3 V LVCMOS driver (outputs Y1–Y4); H, a 5 V 74HC
 * chip (inputs A–D, output Y); T, a 5 V 74HCT receiver (inputs A, B); S, a 1.8 V two-wire
 * part (bidir SDA). The numbers come from the profile library.
 */
export function bench(extra: Partial<Design> = {}): Design {
  return {
    ...design({
      rails: [rail5v0, rail3v3, rail1v8],
      parts: [
        part('D', '3v3', 'lvcmos33', [output('Y1'), output('Y2'), output('Y3'), output('Y4')]),
        part('H', '5v0', '74hc', [input('A'), input('B'), input('C'), input('D'), output('Y')]),
        part('T', '5v0', '74hct', [input('A'), input('B')]),
        part('S', '1v8', 'i2c-lv', [bidir('SDA', { drive: 'open-drain' })]),
      ],
    }),
    ...extra,
  };
}
