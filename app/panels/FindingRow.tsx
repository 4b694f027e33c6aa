/**
 * One finding in the list: a button that selects its net (or part), and beside it what can be
 * done: accept it with a note (a waiver written into the net, or into the pin for a pin on no
 * net; undoable), or withdraw the waiver that covers it. A new waiver covers every power state
 * unless the engineer chooses only this one, so that a power state added later keeps it.
 */
import { memo, useId, useState } from 'react';
import type { Finding } from '../../rules/engine/index.ts';
import { ALL_ON } from '../../rules/engine/index.ts';
import { addWaiver, removeWaiverFor, waiverPlaceOf } from '../store/commands/index.ts';
import { useEditorStore } from '../store/EditorProvider.tsx';
import { FixMenu } from './FixMenu.tsx';

export interface RowText {
  readonly place: string;
  readonly rule: string;
  readonly state: string;
}

/** Whether a new waiver covers every power state (the default) or only the finding's own. */
export type WaiverScope = 'every' | 'this';
export const DEFAULT_WAIVER_SCOPE: WaiverScope = 'every';

/** Findings that have a place to keep a waiver: on a net, or on a lone pin; a rail's findings have none. */
function waivable(f: Finding): boolean {
  return f.net !== null || (f.pins.length === 1 && f.place === f.pins[0]);
}

function WaiverForm({ finding, state, onDone }: { finding: Finding; state: string; onDone: () => void }) {
  const store = useEditorStore();
  const noteId = useId();
  const scopeName = useId();
  const [note, setNote] = useState('');
  const [scope, setScope] = useState<WaiverScope>(DEFAULT_WAIVER_SCOPE);
  const [error, setError] = useState<string | null>(null);
  const place = waiverPlaceOf(finding);
  const accept = () => {
    const out = store
      .getState()
      .apply(
        addWaiver({ ...place, rule: finding.rule, scenario: scope === 'every' ? undefined : finding.scenario }, note),
      );
    if (out.ok) onDone();
    else setError(out.reason);
  };
  return (
    <form
      className="rc-waive-form"
      aria-label={`Accept ${finding.rule} on ${place.net ?? place.pin}`}
      data-testid="waive-form"
      onSubmit={(e) => {
        e.preventDefault();
        accept();
      }}
    >
      <label htmlFor={noteId} className="rc-field-label">
        Why this is acceptable
      </label>
      <textarea
        id={noteId}
        value={note}
        rows={2}
        data-testid="waive-note"
        // biome-ignore lint/a11y/noAutofocus: the note field opens because the user just asked to waive; typing goes there
        autoFocus
        onChange={(e) => {
          setNote(e.target.value);
          setError(null);
        }}
        onKeyDown={(e) => {
          if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) accept();
          if (e.key === 'Escape') onDone();
        }}
      />
      <fieldset className="rc-waive-scope" data-testid="waive-scope">
        <legend className="rc-field-label">Applies</legend>
        <label className="rc-toggle">
          <input
            type="radio"
            name={scopeName}
            checked={scope === 'every'}
            onChange={() => setScope('every')}
            data-testid="waive-every-state"
          />
          in every power state, those added later too
        </label>
        <label className="rc-toggle">
          <input
            type="radio"
            name={scopeName}
            checked={scope === 'this'}
            onChange={() => setScope('this')}
            data-testid="waive-this-state"
          />
          only in “{state}”
        </label>
      </fieldset>
      {error !== null && (
        <span className="rc-field-error" role="alert">
          {error}
        </span>
      )}
      <div className="rc-waive-buttons">
        <button type="submit" className="rc-primary" disabled={note.trim() === ''} data-testid="waive-accept">
          Accept
        </button>
        <button type="button" onClick={onDone}>
          Cancel
        </button>
      </div>
    </form>
  );
}

interface RowProps {
  finding: Finding;
  text: RowText;
  showState: boolean;
  onPick: (f: Finding) => void;
}

function FindingRowView({ finding: f, text, showState, onPick }: RowProps) {
  const store = useEditorStore();
  const [waiving, setWaiving] = useState(false);
  const waived = f.waived !== undefined;
  return (
    <li className={`rc-finding-item${waived ? ' rc-finding-item--waived' : ''}`} data-finding-row={f.id}>
      <button
        type="button"
        className={`rc-finding${waived ? ' rc-finding--waived' : ''}`}
        onClick={() => onPick(f)}
        data-net={f.net ?? ''}
        data-severity={f.severity}
        data-rule={f.rule}
        data-finding={f.id}
        data-waived={waived ? 'true' : 'false'}
      >
        <span className="rc-finding-top">
          <span className="rc-finding-place">{text.place}</span>
          <span className="rc-finding-rule">
            {text.rule}
            {showState && ` · ${text.state}`}
          </span>
        </span>
        <span className="rc-finding-msg">{f.message}</span>
        {waived ? (
          <span className="rc-finding-waiver" data-testid="waiver-note">
            <span className="rc-waived-badge">Waived</span> {f.waived}
          </span>
        ) : (
          <span className="rc-finding-hint">{f.hint}</span>
        )}
      </button>
      <div className="rc-finding-actions">
        {!waivable(f) ? (
          <span className="rc-muted" title="A waiver is kept in a net or in a pin">
            On no net or pin: cannot be waived.
          </span>
        ) : waived ? (
          <button
            type="button"
            className="rc-link"
            data-testid="unwaive"
            onClick={() => store.getState().apply(removeWaiverFor(waiverPlaceOf(f), f.rule, f.scenario))}
          >
            Withdraw the waiver
          </button>
        ) : waiving ? (
          <WaiverForm
            finding={f}
            state={f.scenario === ALL_ON ? 'All rails on' : text.state}
            onDone={() => setWaiving(false)}
          />
        ) : (
          <button
            type="button"
            className="rc-link"
            data-testid="waive"
            aria-label={`Accept with a note: ${text.rule} on ${text.place}`}
            onClick={() => setWaiving(true)}
          >
            Accept with a note…
          </button>
        )}
        {!waiving && <FixMenu finding={f} />}
      </div>
    </li>
  );
}

/** A row re-renders only when its finding (kept by the engine while its net is unchanged) or its text changes. */
export const FindingRow = memo(
  FindingRowView,
  (a, b) =>
    a.finding === b.finding &&
    a.showState === b.showState &&
    a.onPick === b.onPick &&
    a.text.place === b.text.place &&
    a.text.rule === b.text.rule &&
    a.text.state === b.text.state,
);
