/**
 * The quick fixes of one finding: each with one sentence saying what it does and why, a trial
 * re-check on a copy ("what it changes") and Apply, which runs it as one undoable command and
 * then shows the counts before and after. Fixes that rest on a datasheet fact ask the engineer
 * to confirm it first.
 */
import { useMemo, useState } from 'react';
import type { Finding, Summary } from '../../rules/engine/index.ts';
import { namesOf } from '../../rules/engine/index.ts';
import { SeverityGlyph } from '../canvas/SeverityGlyph.tsx';
import {
  applyFix,
  fixesFor,
  mayHaveFixes,
  previewFix,
  type FixPreview,
  type QuickFix,
} from '../store/commands/fixes/index.ts';
import { useEditorStore } from '../store/EditorProvider.tsx';
import './explain.css';

function counts(s: Summary): string {
  return `${s.error} error${s.error === 1 ? '' : 's'}, ${s.warning} warning${s.warning === 1 ? '' : 's'}`;
}

function Changes({ preview }: { preview: FixPreview }) {
  // Nets by label, as the fix's design names them (a fix may add a net of its own).
  const names = useMemo(() => namesOf(preview.design), [preview.design]);
  const place = (f: Finding) => (f.net === null ? f.pins.join(', ') : names.net(f.net));
  if (preview.refused !== undefined)
    return (
      <p className="rc-field-error" role="alert">
        {preview.refused}
      </p>
    );
  return (
    <div className="rc-fix-preview" data-testid="fix-preview">
      <p className="rc-tight">
        Removes {preview.gone.length} finding{preview.gone.length === 1 ? '' : 's'}, brings {preview.added.length}:
      </p>
      <ul>
        {preview.gone.map((f) => (
          <li key={`g-${f.id}`} className="rc-fix-gone">
            <SeverityGlyph severity={f.severity} />{' '}
            <s>
              {f.rule} · {place(f)}
            </s>
          </li>
        ))}
        {preview.added.map((f) => (
          <li key={`a-${f.id}`} className="rc-fix-added" data-severity={f.severity}>
            <SeverityGlyph severity={f.severity} /> {f.rule} · {place(f)}
            {f.waived !== undefined && ' (waived)'}
          </li>
        ))}
      </ul>
    </div>
  );
}

function FixOption({ fix, onApplied }: { fix: QuickFix; onApplied: (before: Summary, after: Summary) => void }) {
  const store = useEditorStore();
  const [preview, setPreview] = useState<FixPreview | null>(null);
  const [confirmed, setConfirmed] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const apply = () => {
    const before = store.getState().result.summary;
    const out = store.getState().apply(applyFix(fix));
    if (out.ok) onApplied(before, store.getState().result.summary);
    else setError(out.reason);
  };
  return (
    <li className="rc-fix" data-fix={fix.id}>
      <strong>{fix.title}</strong>
      <p className="rc-tight">{fix.sentence}</p>
      {fix.figures !== undefined && fix.figures.length > 0 && (
        <table className="rc-fix-figures" data-testid="fix-figures">
          <tbody>
            {fix.figures.map((g) => (
              <tr key={g.label}>
                <th scope="row">{g.label}</th>
                <td>{g.value}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {fix.unavailable !== undefined && (
        <p className="rc-field-error" data-testid="fix-unavailable">
          {fix.unavailable}
        </p>
      )}
      {fix.needsConfirmation === true && (
        <label className="rc-toggle">
          <input
            type="checkbox"
            checked={confirmed}
            onChange={(e) => setConfirmed(e.target.checked)}
            data-testid="fix-confirm"
          />
          I have confirmed this in the part's datasheet
        </label>
      )}
      {preview !== null && <Changes preview={preview} />}
      {error !== null && (
        <p className="rc-field-error" role="alert">
          {error}
        </p>
      )}
      {fix.unavailable === undefined && (
        <div className="rc-waive-buttons">
          <button
            type="button"
            onClick={() => {
              const s = store.getState();
              setPreview(previewFix(fix, s.design, s.result));
            }}
            data-testid="fix-try"
          >
            What it changes
          </button>
          <button
            type="button"
            className="rc-primary"
            onClick={apply}
            disabled={fix.needsConfirmation === true && !confirmed}
            data-testid="fix-apply"
          >
            Apply
          </button>
        </div>
      )}
    </li>
  );
}

/** "Fix…" beside a finding whose rule has a mechanical remedy. */
export function FixMenu({ finding }: { finding: Finding }) {
  const store = useEditorStore();
  const [open, setOpen] = useState(false);
  // Worked out only when the menu opens: a design of hundreds of findings renders them all.
  const fixes = useMemo(() => {
    if (!open) return [];
    const s = store.getState();
    return fixesFor(finding, s.design, s.result);
  }, [open, finding, store]);
  if (!mayHaveFixes(finding)) return null;
  if (!open) {
    return (
      <button
        type="button"
        className="rc-link"
        data-testid="fix-open"
        aria-expanded="false"
        onClick={() => setOpen(true)}
      >
        Fix…
      </button>
    );
  }
  return (
    // biome-ignore lint/a11y/useSemanticElements: a group of buttons, not a form: a fieldset would bring form semantics and styling
    <div
      className="rc-fix-menu"
      role="group"
      aria-label={`Fixes for ${finding.rule} on ${finding.net ?? finding.pins.join(', ')}`}
    >
      {fixes.length === 0 && <p className="rc-muted rc-tight">No quick fix applies to this one: see the hint.</p>}
      <ul>
        {fixes.map((fix) => (
          <FixOption
            key={fix.id}
            fix={fix}
            onApplied={(before, after) => {
              // The row itself goes when its finding does: the status line keeps the account.
              store.getState().notify({
                kind: 'done',
                text: `${fix.title}: before ${counts(before)}, after ${counts(after)} (Ctrl+Z undoes it).`,
              });
              setOpen(false);
            }}
          />
        ))}
      </ul>
      <button type="button" className="rc-link" onClick={() => setOpen(false)}>
        Close
      </button>
    </div>
  );
}
