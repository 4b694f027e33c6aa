/** The rule report (report-format.md): building it, its schema, and its text and Markdown renderings. */
export { buildReport, crossingRows, selectStates, type ReportOptions } from './buildReport.ts';
export { ladderFor, ladderAxis, type Ladder } from './ladder.ts';
export { CAUTIONS } from './cautions.ts';
export { renderText } from './renderText.ts';
export { renderMarkdown, escapeMarkdown, codeSpan } from './renderMarkdown.ts';
export { verdict, type Verdict } from './verdict.ts';
export { TOOL_VERSION, TOOL_NAME } from './version.ts';
export {
  ReportSchema,
  ReportFindingSchema,
  CrossingSchema,
  FailOnSchema,
  REPORT_FORMAT_ID,
  REPORT_FORMAT_VERSION,
  type Report,
  type ReportFinding,
  type Crossing,
  type FailOn,
} from './reportSchema.ts';
export { describeParams, describeProfile } from './describeProfile.ts';
export { discreteValue } from './discreteValue.ts';
export type { LadderDriver, LadderMargin, LadderReceiver } from './ladder.ts';
export { marginVolts, onAxis, separate, STATUS_TEXT, volts } from './ladderLayout.ts';
export { reportPdfFileName, slugOf } from './pdf/fileName.ts';
export { pullLabel, pullWords } from './pullLabel.ts';
