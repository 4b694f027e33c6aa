import { useState } from 'react';
import type { Part } from '../../rules/model/index.ts';
import { resolveProfile } from '../../rules/profiles/index.ts';
import { glyphKind, GLYPH_TEXT, PinGlyph } from '../canvas/PinGlyph.tsx';
import { sideOf } from '../canvas/chipLayout.ts';
import {
  removeWaiverAt,
  renamePart,
  setPartLabel,
  setPartProfile,
  setPartRail,
  setResetState,
} from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { TextField } from './Field.tsx';
import { PinEffective } from './PinEffective.tsx';
import { ProfileOptions } from './ProfileOptions.tsx';

/** A part's designator, label, rail and profile (with its source); its pins, each opening onto its effective values. */
export function PartDetails({ part }: { part: Part }) {
  const store = useEditorStore();
  const rails = useEditor((s) => s.design.rails);
  const local = useEditor((s) => s.design.profiles);
  const profile = useEditor((s) => resolveProfile(s.design, part.profile));
  const [openPin, setOpenPin] = useState<string | null>(null);
  const apply = store.getState().apply;
  const overrides = Object.keys(part.params ?? {}).length;
  return (
    <div className="rc-part-details" data-testid="part-details">
      <h3>
        <span className="rc-chip-id">{part.id}</span> {part.label}
      </h3>
      <div className="rc-two">
        <TextField
          label="Designator"
          value={part.id}
          testId="part-id"
          onCommit={(t) => {
            const out = apply(renamePart(part.id, t));
            if (out.ok) store.getState().select({ parts: [t.trim()], wires: [], net: null });
            return out;
          }}
        />
        <TextField
          label="Label"
          value={part.label}
          testId="part-label"
          onCommit={(t) => apply(setPartLabel(part.id, t))}
        />
      </div>
      <label className="rc-field">
        <span className="rc-field-label">Rail</span>
        <select value={part.rail} data-testid="part-rail" onChange={(e) => apply(setPartRail(part.id, e.target.value))}>
          {rails.map((r) => (
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
          data-testid="part-profile"
          onChange={(e) => apply(setPartProfile(part.id, e.target.value))}
        >
          <ProfileOptions local={local} />
        </select>
      </label>
      <p className="rc-profile-source" data-testid="part-profile-source">
        <span className="rc-muted">Source of the profile's numbers: </span>
        {profile?.source ?? 'unknown profile'}
        {local?.some((p) => p.id === part.profile) === true && (
          <span className="rc-muted"> (a profile of this design)</span>
        )}
      </p>
      <button
        type="button"
        data-testid="part-edit"
        onClick={() => store.getState().openDialog({ kind: 'chip', part: part.id })}
      >
        Edit pins and overrides…
      </button>
      {overrides > 0 && (
        <span className="rc-muted">
          {' '}
          {overrides} override{overrides === 1 ? '' : 's'} for every pin
        </span>
      )}
      {part.pins.some((p) => p.role !== 'input') && (
        <p>
          <button
            type="button"
            data-testid="part-reset-state"
            onClick={() => apply(setResetState(part.id))}
            title="In the power state “reset”, its outputs and bidir pins become inputs, as a controller's pins are before firmware runs"
          >
            Reset state
          </button>
          <span className="rc-muted"> its outputs as inputs before firmware runs</span>
        </p>
      )}
      <h4 className="rc-sub">Pins</h4>
      <ul className="rc-pin-list">
        {part.pins.map((pin) => {
          const kind = glyphKind(pin);
          const open = openPin === pin.id;
          const own = Object.keys(pin.params ?? {}).length;
          return (
            <li key={pin.id} className="rc-pin-item">
              <button
                type="button"
                className="rc-pin-toggle"
                aria-expanded={open}
                data-testid={`pin-toggle-${pin.id}`}
                onClick={() => setOpenPin(open ? null : pin.id)}
              >
                <PinGlyph kind={kind} side="right" />
                <span className="rc-pin-name">{pin.id}</span>
                <span className="rc-muted">
                  {GLYPH_TEXT[kind]} · {sideOf(pin)}
                  {own > 0 ? ` · ${own} override${own === 1 ? '' : 's'}` : ''}
                </span>
              </button>
              {open && <PinEffective part={part} pin={pin} />}
            </li>
          );
        })}
      </ul>
      <PinWaivers part={part} />
    </div>
  );
}

/** The waivers kept in the part's pins (findings of inputs on no net that were accepted), each withdrawable. */
function PinWaivers({ part }: { part: Part }) {
  const store = useEditorStore();
  const scenarios = useEditor((s) => s.design.scenarios);
  const stateLabel = (id: string | undefined) =>
    id === undefined
      ? 'every power state'
      : id === 'all-on'
        ? 'All rails on'
        : ((scenarios ?? []).find((s) => s.id === id)?.label ?? id);
  const rows = part.pins.flatMap((pin) => (pin.waivers ?? []).map((w, k) => ({ pin: pin.id, w, k })));
  if (rows.length === 0) return null;
  return (
    <>
      <h4 className="rc-sub">Waivers of unused pins</h4>
      <ul className="rc-waivers" data-testid="pin-waivers">
        {rows.map(({ pin, w, k }) => (
          <li key={`${pin}:${k}`} data-pin={pin} data-rule={w.rule}>
            <span className="rc-waiver-what">
              <b>{pin}</b> · {w.rule} · {stateLabel(w.scenario)}
            </span>
            <span className="rc-waiver-note">{w.note}</span>
            <button
              type="button"
              className="rc-icon-btn"
              aria-label={`Withdraw the waiver of ${w.rule} on ${pin}`}
              onClick={() => store.getState().apply(removeWaiverAt({ pin: `${part.id}.${pin}` }, k))}
            >
              ×
            </button>
          </li>
        ))}
      </ul>
    </>
  );
}
