/**
 * "New chip" and "Edit chip": the part's designator, label, rail and profile, its overrides
 * for every pin, and the pin table. Nothing reaches the design until "Place chip" or "Apply",
 * which is one command and one undo step.
 */
import { useState } from 'react';
import { usePlaceChip } from '../../canvas/placement.ts';
import { editPart } from '../../store/commands/index.ts';
import { useEditor, useEditorStore } from '../../store/EditorProvider.tsx';
import { withParam } from '../../store/paramFields.ts';
import { Modal } from '../Modal.tsx';
import { ParamEditor } from '../ParamEditor.tsx';
import { ProfileOptions } from '../ProfileOptions.tsx';
import { draftOf, newChipDraft, partFromDraft, rowProblems, setPartFields, type ChipDraft } from './chipDraft.ts';
import { profileParam } from './inherited.ts';
import { PinTable } from './PinTable.tsx';

export function ChipDialog({ partId }: { partId: string | null }) {
  const store = useEditorStore();
  const design = useEditor((s) => s.design);
  const place = usePlaceChip();
  const [draft, setDraft] = useState<ChipDraft | undefined>(() => {
    const d = store.getState().design;
    if (partId === null) return newChipDraft(d);
    const part = d.parts.find((p) => p.id === partId);
    return part === undefined ? undefined : draftOf(part);
  });
  const [error, setError] = useState<string | null>(null);
  const close = () => store.getState().openDialog(null);
  if (draft === undefined) return null;

  const change = (next: ChipDraft) => {
    setDraft(next);
    setError(null);
  };

  const commit = () => {
    const rowProblem = [...rowProblems(draft).values()][0];
    if (rowProblem !== undefined) {
      setError(rowProblem);
      return;
    }
    const { part, pinMap } = partFromDraft(draft);
    const s = store.getState();
    const out = draft.orig === null ? place(part) : s.apply(editPart(draft.orig, part, pinMap));
    if (!out.ok) {
      setError(out.reason);
      return;
    }
    if (draft.orig !== null) s.select({ parts: [part.id], wires: [], net: null });
    close();
  };

  const { part } = draft;
  const partOverrides = Object.keys(part.params ?? {}).length;
  return (
    <Modal
      title={draft.orig === null ? 'New chip' : `Edit ${draft.orig}`}
      onClose={close}
      wide
      testId="chip-dialog"
      footer={
        <>
          {error !== null && (
            <span className="rc-field-error rc-modal-error" role="alert" data-testid="chip-error">
              {error}
            </span>
          )}
          <button type="button" onClick={close}>
            Cancel
          </button>
          <button type="button" className="rc-primary" data-testid="chip-commit" onClick={commit}>
            {draft.orig === null ? 'Place chip' : 'Apply changes'}
          </button>
        </>
      }
    >
      <div className="rc-chip-form">
        <label className="rc-field">
          <span className="rc-field-label">Designator</span>
          <input
            type="text"
            value={part.id}
            data-testid="chip-id"
            spellCheck={false}
            data-autofocus
            onChange={(e) => change(setPartFields(draft, { id: e.target.value.trim() }))}
          />
        </label>
        <label className="rc-field rc-chip-form-label">
          <span className="rc-field-label">Label</span>
          <input
            type="text"
            value={part.label}
            data-testid="chip-label"
            onChange={(e) => change(setPartFields(draft, { label: e.target.value }))}
          />
        </label>
        <label className="rc-field">
          <span className="rc-field-label">Rail</span>
          <select
            value={part.rail}
            data-testid="chip-rail"
            onChange={(e) => change(setPartFields(draft, { rail: e.target.value }))}
          >
            {design.rails.map((r) => (
              <option key={r.id} value={r.id}>
                {r.label} ({r.nominal} V)
              </option>
            ))}
          </select>
        </label>
        <label className="rc-field">
          <span className="rc-field-label">Profile</span>
          <select
            value={part.profile}
            data-testid="chip-profile"
            onChange={(e) => change(setPartFields(draft, { profile: e.target.value }))}
          >
            <ProfileOptions local={design.profiles} />
          </select>
        </label>
      </div>
      <details className="rc-fold">
        <summary>Overrides for every pin{partOverrides > 0 ? ` (${partOverrides})` : ''}</summary>
        <ParamEditor
          params={part.params}
          label="Overrides for every pin of the part"
          testId="part-param"
          fallback={(key) => profileParam(design, part.profile, key)}
          onChange={(key, value) => {
            change(setPartFields(draft, { params: withParam(part.params, key, value) }));
            return { ok: true, changed: true };
          }}
        />
      </details>
      <h3 className="rc-modal-sub">Pins</h3>
      <PinTable design={design} draft={draft} onChange={change} />
    </Modal>
  );
}
