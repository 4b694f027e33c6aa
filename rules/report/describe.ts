/** Wording shared by the text and Markdown renderings. */
import { formatMargin, formatQuantity } from '../levels/units.ts';
import { railNameIn } from './reportNames.ts';
import type { Report, ReportFinding } from './reportSchema.ts';

/** A margin in engineering notation; `—` when the net has no driver/receiver pair. */
export function marginText(margin: number | null): string {
  return margin === null ? '—' : formatMargin(margin);
}

/** `5 parts, 7 nets, 3 rails`. */
export function designLine(report: Report): string {
  const { parts, nets, rails } = report.design;
  const n = (k: number, w: string) => `${k} ${w}${k === 1 ? '' : 's'}`;
  return `${n(parts, 'part')}, ${n(nets, 'net')}, ${n(rails, 'rail')}`;
}

/** `minimum margin 200 mV, wiring capacitance 5 pF, fail on error`. */
export function settingsLine(report: Report): string {
  const s = report.settings;
  return `minimum margin ${formatQuantity(s.minMargin, 'V')}, default wiring capacitance ${formatQuantity(s.defaultWiringCapacitance, 'F')}, fail on ${s.failOn}`;
}

/** `all-on (All rails on)`, `pump-off (Pump off; off: 5v0)`. */
export function stateText(s: Report['scenarios'][number], report: Pick<Report, 'names'>): string {
  const off = s.off.map((r) => railNameIn(report, r)).join(', ');
  return s.off.length === 0 ? `${s.id} (${s.label})` : `${s.id} (${s.label}; off: ${off})`;
}

/** `error`, or `error, waived` for a waived finding. */
export function severityText(f: ReportFinding): string {
  return f.waived === undefined ? f.severity : `${f.severity}, waived`;
}
