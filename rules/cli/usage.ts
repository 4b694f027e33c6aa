/** The command line's help text (`railcross --help`). */
import { TOOL_NAME } from '../report/version.ts';

export const USAGE = `${TOOL_NAME}: check the signals between chips on a mixed-rail board.

Usage:
  railcross check FILE [options]    check a design file and print its report
  railcross profiles [--json]       list the built-in logic-family profiles and their sources
  railcross help, --help            show this text
  railcross --version               print the version

Options of check:
  --json                    print the report as JSON (the same as --format json)
  --format text|json|md     text: a summary for a terminal (the default);
                            json: the report; md: Markdown for a review or a pull request
  --out PATH                also write the JSON report to PATH
  --pdf PATH                also write the PDF report to PATH (cover, block diagram,
                            findings, rail crossings, margins per net, method, cautions)
  --paper a4|letter         the PDF report's page size (default: a4)
  --scenario ID             check one power state alone: all-on or a scenario id of the design
  --min-margin V            the least noise margin that passes without a warning,
                            e.g. 0.3, 300m or "300 mV" (overrides the design's setting)
  --fail-on error|warning   the least severity that fails the check (default: error)

Exit status:
  0  no unwaived finding at the --fail-on level
  1  at least one unwaived finding at the --fail-on level
  2  nothing was checked: the file cannot be read or is not a valid design,
     or an option is unknown or has a bad value
`;
