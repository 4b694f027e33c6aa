import { parseQuantity, type QuantityResult } from '../../rules/levels/units.ts';

/** Tolerance typed as a percentage (`5`, `5 %`, `2.5%`), stored as a fraction. */
export function parsePercent(text: string): QuantityResult {
  const read = parseQuantity(text.replace(/%\s*$/, '').replace(/^±/, ''));
  return read.ok ? { ok: true, value: read.value / 100 } : read;
}

export function formatPercent(fraction: number): string {
  return `${Number((fraction * 100).toPrecision(4))} %`;
}
