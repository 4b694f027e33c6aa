/** The command line's help text (`railcross --help`). */
import { TOOL_NAME } from '../report/version.ts';

export const USAGE = `${TOOL_NAME}: check the signals between chips on a mixed-rail board.

Usage:
  railcross check FILE [options]    check a design file and print its report
  railcross diff OLD NEW [options]  compare the findings of two designs (or saved reports)
  railcross profiles [--json]       list the built-in logic-family profiles and their sources
  railcross help, --help            show this text
  railcross --version               print the version

Options of check:
  --format FORMAT           text: a summary for a terminal (the default); json: the report;
                            md: Markdown for a review or a pull request; sarif: SARIF 2.1.0
                            for code scanning; junit: JUnit XML, a test case per net and
                            power state
  --json                    the same as --format json
  --quiet                   print only the verdict line (text)
  --verbose                 list info findings too, not only their count (text)
  --out PATH                also write the JSON report to PATH
  --pdf PATH                also write the PDF report to PATH (cover, block diagram,
                            findings, rail crossings, margins per net, method, cautions)
  --paper a4|letter         the PDF report's page size (default: a4)
  --scenario ID             check one power state alone: all-on or a scenario id of the design
  --min-margin V            the least noise margin that passes without a warning,
                            e.g. 0.3, 300m or "300 mV" (overrides the design's setting)
  --fail-on error|warning   the least severity that fails the check (default: error)
  --baseline REPORT         fail only on findings that REPORT (a JSON report from --out,
                            or a design file) does not hold at the same severity or worse

Options of diff (OLD and NEW: design files or JSON reports):
  --format text|md|json     text (the default), Markdown for a review comment, or JSON
  --fail-on error|warning   which new or worsened findings make the exit status 1

Exit status:
  0  check: no unwaived finding at the --fail-on level (beyond the baseline);
     diff: no finding fails that did not fail before
  1  check: at least one unwaived finding at the --fail-on level;
     diff: a finding is new at the --fail-on level, rose to it or lost its waiver
  2  nothing was checked: a file cannot be read or is not a valid design or report,
     or an option is unknown or has a bad value
`;
