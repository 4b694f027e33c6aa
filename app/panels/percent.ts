/**
 * A rail's tolerance as people write it, "± 5 %", while the file keeps the fraction (0.05).
 * Anything typed with another unit is refused with a reason that says the field takes percent,
 * and for a voltage, what that voltage would be as a percent of the rail's nominal.
 */
import { formatQuantity, parseQuantity, type QuantityResult, type Unit } from '../../rules/levels/index.ts';

/** The fraction as the field shows it: `± 5 %`, `± 2.5 %`. */
export function formatPercent(fraction: number): string {
  return `± ${Number((fraction * 100).toPrecision(4))} %`;
}

/** What a quantity of another unit is, for the refusal. */
const KIND: Readonly<Partial<Record<Unit, string>>> = {
  V: 'a voltage',
  A: 'a current',
  Ω: 'a resistance',
  F: 'a capacitance',
  s: 'a time',
};

const PLAIN_NUMBER = /^(\d+(\.\d*)?|\.\d+)$/;

/**
 * Tolerance typed as a percentage (`5`, `5 %`, `± 2.5 %`, `±2.5%`), read as a fraction.
 * `nominal` (V), when given, lets a voltage typed by mistake be turned into the percent it
 * would be, in the refusal.
 */
export function parsePercent(text: string, nominal?: number): QuantityResult {
  const typed = text.trim();
  const body = typed
    .replace(/^(±|\+\/-|\+-)\s*/, '')
    .replace(/\s*%$/, '')
    .trim();
  if (body === '') return { ok: false, error: 'expected the tolerance in percent, e.g. ± 5 %' };
  if (PLAIN_NUMBER.test(body)) return { ok: true, value: Number(body) / 100 };
  if (/^[-−]/.test(body)) return { ok: false, error: 'a tolerance is 0 % or more, e.g. ± 5 %' };
  for (const unit of Object.keys(KIND) as Unit[]) {
    const read = parseQuantity(body, unit);
    // parseQuantity takes a bare number as the unit too: only a unit actually written counts here.
    if (!read.ok || !body.endsWith(unit)) continue;
    const asPercent =
      unit === 'V' && nominal !== undefined && nominal > 0
        ? `; ${formatQuantity(read.value, 'V')} of the ${formatQuantity(nominal, 'V')} nominal is ${formatPercent(read.value / nominal)}`
        : '';
    return {
      ok: false,
      error: `"${typed}" is ${KIND[unit]}: the tolerance takes percent of the nominal voltage, e.g. ± 5 %${asPercent}`,
    };
  }
  return { ok: false, error: `expected the tolerance in percent, e.g. ± 5 %; found "${typed}"` };
}
