/**
 * The design's own profiles: each made from a built-in one, then edited, and each saying
 * where its numbers come from. A part or pin uses one by choosing it as its profile.
 */
import { useId, useState } from 'react';
import { BUILTIN_PROFILES } from '../../rules/profiles/index.ts';
import {
  addProfile,
  deleteProfile,
  localProfileId,
  setProfileLabel,
  setProfileParam,
  setProfileSource,
} from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { TextField } from './Field.tsx';
import { ParamEditor } from './ParamEditor.tsx';

function NewProfileForm() {
  const store = useEditorStore();
  const sourceId = useId();
  const [base, setBase] = useState('mcu-gpio');
  const [source, setSource] = useState('');
  const [error, setError] = useState<string | null>(null);
  const create = () => {
    const s = store.getState();
    const out = s.apply(addProfile(base, localProfileId(s.design, base), '', source));
    if (out.ok) setSource('');
    setError(out.ok ? null : out.reason);
  };
  return (
    <form
      className="rc-new-profile"
      aria-label="New profile of this design"
      onSubmit={(e) => {
        e.preventDefault();
        create();
      }}
    >
      <label className="rc-field">
        <span className="rc-field-label">Start from</span>
        <select value={base} onChange={(e) => setBase(e.target.value)} data-testid="profile-base">
          {BUILTIN_PROFILES.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </select>
      </label>
      <label className="rc-field" htmlFor={sourceId}>
        <span className="rc-field-label">Where the edited numbers come from (required)</span>
        <input
          id={sourceId}
          type="text"
          value={source}
          placeholder="e.g. datasheet of the chosen part, table 7"
          data-testid="profile-source-new"
          onChange={(e) => {
            setSource(e.target.value);
            setError(null);
          }}
          aria-invalid={error !== null}
        />
      </label>
      {error !== null && (
        <span className="rc-field-error" role="alert">
          {error}
        </span>
      )}
      <button type="submit" disabled={source.trim() === ''} data-testid="profile-create">
        Make a profile of this design
      </button>
    </form>
  );
}

export function ProfilesEditor() {
  const store = useEditorStore();
  const profiles = useEditor((s) => s.design.profiles);
  const apply = store.getState().apply;
  const [open, setOpen] = useState<string | null>(null);
  return (
    <div className="rc-profiles">
      <p className="rc-muted">
        A profile here shadows a library profile of the same id. Choose it as a part's or a pin's profile.
      </p>
      {(profiles ?? []).map((p) => (
        <div key={p.id} className="rc-rail-row" data-profile={p.id}>
          <div className="rc-rail-top">
            <TextField
              label={`Name of profile ${p.id}`}
              quiet
              value={p.label}
              onCommit={(t) => apply(setProfileLabel(p.id, t))}
            />
            <button
              type="button"
              className="rc-icon-btn"
              aria-label={`Delete profile ${p.label}`}
              title="Delete (only when no part uses it)"
              onClick={() => apply(deleteProfile(p.id))}
            >
              ×
            </button>
          </div>
          <TextField
            label="Source"
            value={p.source}
            testId={`profile-source-${p.id}`}
            onCommit={(t) => apply(setProfileSource(p.id, t))}
          />
          <button
            type="button"
            className="rc-link"
            aria-expanded={open === p.id}
            onClick={() => setOpen(open === p.id ? null : p.id)}
          >
            {open === p.id ? 'Hide parameters' : 'Parameters…'}
          </button>
          {open === p.id && (
            <ParamEditor
              params={p.params}
              label={`Parameters of profile ${p.label}`}
              testId={`profile-${p.id}-param`}
              valueHeading="Value"
              onChange={(key, value) => apply(setProfileParam(p.id, key, value))}
            />
          )}
        </div>
      ))}
      <NewProfileForm />
    </div>
  );
}
