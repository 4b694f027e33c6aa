/**
 * A design too large to edit comfortably (more than LARGE_DESIGN_PARTS parts) waits for a
 * choice instead of freezing the page: open it anyway, open it read-only (every edit refused,
 * nothing saved), or only check it (in the worker) and download its report.
 */
import { LARGE_DESIGN_PARTS } from '../check/jobs.ts';
import { NativeDialog } from '../panels/NativeDialog.tsx';
import { downloadFile } from './download.ts';
import type { LargeAction } from './session.ts';
import { useSession, useSessionState } from './SessionProvider.tsx';

const n = (x: number) => x.toLocaleString('en');
const plural = (x: number, one: string) => `${n(x)} ${one}${x === 1 ? '' : 's'}`;

export function LargePrompt() {
  const session = useSession();
  const large = useSessionState((s) => s.large);
  if (large === null) return null;
  const choose = (action: LargeAction) => () => void session.chooseLarge(action);
  const busy = large.busy !== null;
  const where = large.source === 'start' ? 'It was open when this page last closed. ' : '';
  return (
    <NativeDialog
      key={large.id}
      className="rc-conflict rc-large"
      labelledBy="rc-large-head"
      describedBy="rc-large-body"
      testId="large-design"
      onClose={busy ? undefined : choose('cancel')}
    >
      <h2 id="rc-large-head">
        “{large.title}” is a large design: {plural(large.parts, 'part')}
      </h2>
      <p id="rc-large-body">
        {where}Above {n(LARGE_DESIGN_PARTS)} parts the editor opens slowly and every change waits for its check. Choose
        how to open it.
        {large.counts !== null &&
          ` When last checked: ${plural(large.counts.errors, 'error')}, ${plural(large.counts.warnings, 'warning')}.`}
      </p>
      <div className="rc-dialog-actions">
        <button
          type="button"
          className="rc-primary"
          data-autofocus
          disabled={busy}
          data-testid="large-read-only"
          onClick={choose('read-only')}
        >
          Open read-only
        </button>
        <button type="button" disabled={busy} data-testid="large-open" onClick={choose('open')}>
          Open anyway
        </button>
        <button type="button" disabled={busy} data-testid="large-report" onClick={choose('report')}>
          Report only
        </button>
        <button type="button" disabled={busy} data-testid="large-cancel" onClick={choose('cancel')}>
          Not now
        </button>
      </div>
      {busy && (
        <p className="rc-dialog-foot" role="status" data-testid="large-busy">
          {large.busy}
        </p>
      )}
      {large.error !== null && (
        <p className="rc-large-error" role="alert">
          The check could not be made: {large.error}
        </p>
      )}
      {large.report !== null && (
        <div className="rc-large-report" data-testid="large-report-ready">
          <p>
            Checked: <strong data-count="error">{plural(large.report.counts.errors, 'error')}</strong>,{' '}
            <strong data-count="warning">{plural(large.report.counts.warnings, 'warning')}</strong> unwaived,{' '}
            {plural(large.report.findings, 'finding')} in all.
          </p>
          <button
            type="button"
            className="rc-primary"
            data-testid="large-download"
            onClick={() => downloadFile(large.report!.fileName, large.report!.text, 'application/json')}
          >
            Download the report (JSON)
          </button>
        </div>
      )}
      <p className="rc-dialog-foot">
        Read-only shows every chip, wire and finding and changes nothing; “Edit” beside the title opens it for editing
        later. Report only checks it without opening it.
      </p>
    </NativeDialog>
  );
}
