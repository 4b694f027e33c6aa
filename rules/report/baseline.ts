/**
 * Judging a report against a baseline (`railcross check --baseline REPORT.json`): only findings
 * that the baseline does not already hold can fail the check, so that a design with known
 * problems can be kept from growing new ones.
 */
import type { FailOn, Report, ReportFinding } from './reportSchema.ts';
import { plural, type Verdict } from './verdict.ts';

const RANK = { info: 0, warning: 1, error: 2 } as const;

/** The baseline's findings by id, with the most severe severity each had. */
export type Baseline = ReadonlyMap<string, ReportFinding['severity']>;

export function baselineOf(report: Report): Baseline {
  const known = new Map<string, ReportFinding['severity']>();
  for (const f of report.findings) {
    const had = known.get(f.id);
    if (had === undefined || RANK[f.severity] > RANK[had]) known.set(f.id, f.severity);
  }
  return known;
}

/**
 * A finding the baseline already holds: the same id (rule, net or pin, power state, pair) at the
 * same or a more severe severity. A finding whose severity grew since is new: it got worse.
 */
export function inBaseline(f: ReportFinding, baseline: Baseline): boolean {
  const had = baseline.get(f.id);
  return had !== undefined && RANK[had] >= RANK[f.severity];
}

/** Whether an unwaived finding reaches the fail-on level. */
export function reaches(f: ReportFinding, failOn: FailOn): boolean {
  return f.waived === undefined && (f.severity === 'error' || (failOn === 'warning' && f.severity === 'warning'));
}

/** The report's verdict when only findings beyond the baseline may fail it. */
export function baselineVerdict(report: Report, baseline: Baseline): Verdict {
  const failOn = report.settings.failOn;
  const fresh = { error: 0, warning: 0 };
  let known = 0;
  for (const f of report.findings) {
    if (!reaches(f, failOn)) continue;
    if (inBaseline(f, baseline)) known++;
    else if (f.severity === 'error') fresh.error++;
    else fresh.warning++;
  }
  const count = fresh.error + fresh.warning;
  const knownText = `${plural(known, 'finding')} at that level already in the baseline`;
  if (count > 0) {
    const parts = [
      ...(fresh.error > 0 ? [plural(fresh.error, 'error')] : []),
      ...(fresh.warning > 0 ? [plural(fresh.warning, 'warning')] : []),
    ];
    return {
      fails: true,
      count,
      line: `FAIL: unwaived findings at the fail-on level (${failOn}) not in the baseline: ${parts.join(' and ')}; ${knownText}.`,
    };
  }
  return {
    fails: false,
    count: 0,
    line: `PASS: no unwaived finding at the fail-on level (${failOn}) beyond the baseline; ${knownText}.`,
  };
}
