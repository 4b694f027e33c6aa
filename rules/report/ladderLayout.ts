/**
 * The text and label placement every drawing of a voltage ladder shares (the editor's SVG and
 * the PDF report), so that a margin reads the same number wherever it is printed.
 */
import { formatQuantity } from '../levels/units.ts';

/**
 * Text baselines at least `gap` apart, each as close to its wish as that allows, in the order
 * of the wishes.
 */
export function separate(wishes: readonly number[], gap = 13): number[] {
  const order = wishes.map((y, k) => ({ y, k })).sort((a, b) => a.y - b.y);
  const placed: number[] = new Array<number>(wishes.length);
  let last = -Infinity;
  for (const { y, k } of order) {
    last = Math.max(y, last + gap);
    placed[k] = last;
  }
  return placed;
}

/**
 * A voltage as a ladder draws it: on its axis, 0 V to `top`. A level beyond (a guaranteed VOH
 * extrapolated below 0 V from test points of absurdly small currents, say) sits at the axis'
 * end; its label still prints the number itself.
 */
export function onAxis(v: number, top: number): number {
  if (Number.isNaN(v)) return 0;
  return Math.min(top, Math.max(0, v));
}

/** A level as a ladder prints it: engineering notation, four digits (a rail's 3.135 V stays 3.135 V). */
export function volts(v: number): string {
  return formatQuantity(v, 'V', 4);
}

/** A margin as a ladder prints it: three digits are enough for a difference. */
export function marginVolts(v: number): string {
  return formatQuantity(v, 'V', 3);
}

/** Status in words, so that a ladder reads without colour. */
export const STATUS_TEXT = { pass: 'pass', warning: 'WARN', fail: 'FAIL' } as const;
