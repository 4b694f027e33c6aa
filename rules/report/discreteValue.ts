/**
 * A part between chips as the canvas and the PDF diagram label it: a resistor's IEC 60062 code
 * with a small k (`4k7`, as engineers write it on a drawing) and its tolerance, a shifter's
 * deciding figure.
 */
import { formatIec60062, formatQuantity } from '../levels/units.ts';
import { DEFAULT_RESISTOR_TOLERANCE, type Discrete } from '../model/schema.ts';

export function discreteValue(d: Discrete): string {
  if (d.kind === 'resistor') {
    const code = formatIec60062(d.ohms).replace('K', 'k');
    const tol = d.tolerance ?? DEFAULT_RESISTOR_TOLERANCE;
    return `${code} ±${Number((tol * 100).toPrecision(3))} %`;
  }
  if (d.kind === 'fet-shifter') return `VGS(th) ≤ ${formatQuantity(d.vgsThMax, 'V')}`;
  return `Vf ≤ ${formatQuantity(d.vfMax, 'V')}`;
}
