/**
 * The extra supply current of inputs held high below their supply (`interface-power`), summed
 * per power state and rail: the cost of a board that relies on many such inputs.
 */
import type { Finding } from '../engine/types.ts';

export interface InterfacePowerRow {
  readonly scenario: string;
  readonly rail: string;
  /** Σ ΔICC of the rail's inputs in that power state, A. */
  readonly current: number;
  /** The inputs, `PART.PIN`, in the findings' order. */
  readonly pins: readonly string[];
}

/** One row per (power state, rail) with unwaived `interface-power` findings, in the findings' order. */
export function interfacePowerRows(findings: readonly Finding[]): InterfacePowerRow[] {
  const rows = new Map<string, { scenario: string; rail: string; current: number; pins: string[] }>();
  for (const f of findings) {
    if (f.rule !== 'interface-power' || f.waived !== undefined) continue;
    const { rail, current, pin } = f.values;
    // An undecided current (null) cannot be summed; its finding is an error of its own.
    if (current === null) continue;
    const key = `${f.scenario}\u0000${rail}`;
    let row = rows.get(key);
    if (row === undefined) {
      row = { scenario: f.scenario, rail, current: 0, pins: [] };
      rows.set(key, row);
    }
    row.current += current;
    row.pins.push(pin);
  }
  return [...rows.values()];
}
