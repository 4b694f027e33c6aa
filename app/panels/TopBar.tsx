/** The top bar: the design's title, the power state the wires show, the counts, undo/redo, new/example. */
import { useReactFlow } from '@xyflow/react';
import type { Finding, Severity } from '../../rules/engine/index.ts';
import { setTitle } from '../store/commands/index.ts';
import { useSession } from '../session/SessionProvider.tsx';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { newDesign } from '../../rules/model/index.ts';
import { SeverityGlyph } from '../canvas/SeverityGlyph.tsx';
import { fitViewOptions } from '../canvas/placement.ts';
import { exampleDesign } from '../example.ts';
import { TextField } from './Field.tsx';
import { ExportMenu } from '../session/ExportMenu.tsx';
import { LibraryButton } from '../session/LibraryButton.tsx';

function countIn(findings: readonly Finding[], state: string, severity: Severity): number {
  let n = 0;
  for (const f of findings) if (f.scenario === state && f.severity === severity && f.waived === undefined) n++;
  return n;
}

export function TopBar() {
  const store = useEditorStore();
  const title = useEditor((s) => s.design.title);
  const states = useEditor((s) => s.result.states);
  const powerState = useEditor((s) => s.powerState);
  const errors = useEditor((s) => countIn(s.result.findings, s.powerState, 'error'));
  const warnings = useEditor((s) => countIn(s.result.findings, s.powerState, 'warning'));
  const allErrors = useEditor((s) => s.result.summary.error);
  const allWarnings = useEditor((s) => s.result.summary.warning);
  const undoName = useEditor((s) => s.past[s.past.length - 1]?.name);
  const redoName = useEditor((s) => s.future[0]?.name);
  const { fitView } = useReactFlow();
  const readOnly = useEditor((s) => s.readOnly);

  const session = useSession();
  // A new design or the example opens as a design of its own in the library: the one open now
  // stays there as it is (without a library, it is replaced in place, one undo step).
  const open = (design: ReturnType<typeof newDesign>) => {
    void session.createAndOpen(design).then(() => requestAnimationFrame(() => void fitView(fitViewOptions)));
  };

  return (
    <header className="rc-topbar">
      <div className="rc-brand" role="img" aria-label="Railcross">
        <svg viewBox="0 0 20 20" width="20" height="20" aria-hidden="true" className="rc-brand-mark">
          <path d="M2 6 H18 M2 14 H18 M7 2 V18 M13 2 V18" />
        </svg>
        <span>Railcross</span>
      </div>
      <LibraryButton />
      <div className="rc-title">
        <TextField
          label="Design title"
          quiet
          value={title}
          testId="design-title"
          onCommit={(t) => store.getState().apply(setTitle(t))}
        />
      </div>
      {readOnly && session.openId !== null && (
        <span className="rc-read-only" data-testid="read-only">
          <span className="rc-read-only-badge">Read-only</span>
          <button
            type="button"
            data-testid="edit-anyway"
            title="Open this design for editing (each change waits for its check)"
            onClick={() => void session.editAnyway()}
          >
            Edit
          </button>
        </span>
      )}
      <label className="rc-state-pick">
        <span>Power state</span>
        <select
          value={powerState}
          data-testid="power-state"
          onChange={(e) => store.getState().setPowerState(e.target.value)}
        >
          {states.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label}
            </option>
          ))}
        </select>
      </label>
      <div
        className="rc-counts"
        title={`Unwaived findings in this power state; in all power states: ${allErrors} errors, ${allWarnings} warnings`}
      >
        <span className="rc-count rc-count--error" data-count="error">
          <SeverityGlyph severity="error" /> {errors} {errors === 1 ? 'error' : 'errors'}
        </span>
        <span className="rc-count rc-count--warning" data-count="warning">
          <SeverityGlyph severity="warning" /> {warnings} {warnings === 1 ? 'warning' : 'warnings'}
        </span>
        {(allErrors !== errors || allWarnings !== warnings) && (
          <span className="rc-count-all">
            all states: {allErrors} / {allWarnings}
          </span>
        )}
      </div>
      <div className="rc-history">
        <button
          type="button"
          disabled={undoName === undefined}
          title={undoName === undefined ? 'Nothing to undo' : `Undo: ${undoName} (Ctrl+Z)`}
          data-testid="undo"
          onClick={() => store.getState().undo()}
        >
          Undo
        </button>
        <button
          type="button"
          disabled={redoName === undefined}
          title={redoName === undefined ? 'Nothing to redo' : `Redo: ${redoName} (Ctrl+Shift+Z)`}
          data-testid="redo"
          onClick={() => store.getState().redo()}
        >
          Redo
        </button>
      </div>
      <ExportMenu />
      <div className="rc-docs">
        <button type="button" data-testid="new-design" onClick={() => open(newDesign())}>
          New design
        </button>
        <button type="button" data-testid="open-example" onClick={() => open(exampleDesign())}>
          Open example
        </button>
      </div>
    </header>
  );
}
