/** How the report's readers name a net or a rail: by the label the report carries, else the id. */
import type { Report } from './reportSchema.ts';

/** A net's label from the report (its id when it has none, or the report predates labels). */
export function netNameIn(report: Pick<Report, 'names'>, id: string): string {
  return report.names?.nets[id] ?? id;
}

/** A rail's label from the report (its id in a report written before labels were kept). */
export function railNameIn(report: Pick<Report, 'names'>, id: string): string {
  return report.names?.rails[id] ?? id;
}
