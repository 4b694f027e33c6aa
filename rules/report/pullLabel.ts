/**
 * A pull resistor as a drawing labels it: its value as an IEC 60062 code (`4K7`, as printed on
 * resistors and in parts lists) with an arrow for its direction, and where it goes; the same
 * words on the canvas and in the PDF diagram.
 */
import type { Pull, Rail } from '../model/schema.ts';
import { formatIec60062, formatQuantity } from '../levels/units.ts';

/**
 * `↑4K7 3.3 V` for a pull-up to a 3.3 V rail (its nominal voltage, as the chips' rail badges
 * show it: short enough to sit beside a name), `↓10K GND` for a pull-down.
 */
export function pullLabel(pull: Pull, rails: readonly Rail[]): string {
  const code = formatIec60062(pull.ohms) || formatQuantity(pull.ohms, 'Ω');
  if (pull.to === 'ground') return `↓${code} GND`;
  const rail = rails.find((r) => r.id === pull.to);
  return `↑${code} ${rail === undefined ? pull.to : formatQuantity(rail.nominal, 'V')}`;
}

/** The same in words, for a tooltip: `pull-up 4.7 kΩ to 3.3 V (3v3)`. */
export function pullWords(pull: Pull, rails: readonly Rail[]): string {
  const value = formatQuantity(pull.ohms, 'Ω');
  if (pull.to === 'ground') return `pull-down ${value} to ground`;
  const rail = rails.find((r) => r.id === pull.to);
  return `pull-up ${value} to ${rail === undefined ? pull.to : `${rail.label} (${rail.id})`}`;
}
