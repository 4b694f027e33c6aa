/** Whether a report fails its `--fail-on` level, and the one line that says so. */
import type { Report } from './reportSchema.ts';

/** The outcome of a report against its own `settings.failOn`. */
export interface Verdict {
  /** An unwaived finding reaches the fail-on level. */
  readonly fails: boolean;
  /** How many unwaived findings are at or above it. */
  readonly count: number;
  /** One sentence, e.g. `FAIL: unwaived findings at the fail-on level (error): 4 errors.` */
  readonly line: string;
}

/** `1 error`, `2 warnings`. */
export function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** Judges a report by its `settings.failOn`: errors only, or errors and warnings. */
export function verdict(report: Report): Verdict {
  const { error, warning, info, waived } = report.summary;
  const failOn = report.settings.failOn;
  const count = failOn === 'warning' ? error + warning : error;
  if (count > 0) {
    const parts = [
      ...(error > 0 ? [plural(error, 'error')] : []),
      ...(failOn === 'warning' && warning > 0 ? [plural(warning, 'warning')] : []),
    ];
    return {
      fails: true,
      count,
      line: `FAIL: unwaived findings at the fail-on level (${failOn}): ${parts.join(' and ')}.`,
    };
  }
  const rest = [
    ...(failOn === 'error' && warning > 0 ? [plural(warning, 'warning')] : []),
    plural(info, 'info finding'),
    `${waived} waived`,
  ];
  return {
    fails: false,
    count: 0,
    line: `PASS: no unwaived finding at the fail-on level (${failOn}); ${rest.join(', ')}.`,
  };
}
