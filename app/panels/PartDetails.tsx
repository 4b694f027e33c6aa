import type { Part } from '../../rules/model/schema.ts';
import { BUILTIN_PROFILES } from '../../rules/profiles/index.ts';
import { glyphKind, GLYPH_TEXT, PinGlyph } from '../canvas/PinGlyph.tsx';
import { sideOf } from '../canvas/chipLayout.ts';
import { setPartLabel, setPartProfile, setPartRail } from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { TextField } from './Field.tsx';

/** A part's label, rail and profile; its pins for reference. */
export function PartDetails({ part }: { part: Part }) {
  const store = useEditorStore();
  const rails = useEditor((s) => s.design.rails);
  const local = useEditor((s) => s.design.profiles);
  const apply = store.getState().apply;
  return (
    <div className="rc-part-details" data-testid="part-details">
      <h3><span className="rc-chip-id">{part.id}</span> {part.label}</h3>
      <TextField label="Label" value={part.label} testId="part-label" onCommit={(t) => apply(setPartLabel(part.id, t))} />
      <label className="rc-field">
        <span className="rc-field-label">Rail</span>
        <select value={part.rail} data-testid="part-rail" onChange={(e) => apply(setPartRail(part.id, e.target.value))}>
          {rails.map((r) => <option key={r.id} value={r.id}>{r.label} ({r.nominal} V)</option>)}
        </select>
      </label>
      <label className="rc-field">
        <span className="rc-field-label">Profile</span>
        <select value={part.profile} data-testid="part-profile" onChange={(e) => apply(setPartProfile(part.id, e.target.value))}>
          {local !== undefined && local.length > 0 && (
            <optgroup label="This design">
              {local.map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}
            </optgroup>
          )}
          <optgroup label="Library">
            {BUILTIN_PROFILES.filter((p) => !local?.some((l) => l.id === p.id)).map((p) => <option key={p.id} value={p.id}>{p.label}</option>)}
          </optgroup>
        </select>
      </label>
      <div className="rc-sub">Pins</div>
      <ul className="rc-pin-list">
        {part.pins.map((pin) => {
          const kind = glyphKind(pin);
          return (
            <li key={pin.id}>
              <PinGlyph kind={kind} side="right" />
              <span className="rc-pin-name">{pin.id}</span>
              <span className="rc-muted">{GLYPH_TEXT[kind]}{pin.rail !== undefined ? `, rail ${pin.rail}` : ''}{pin.profile !== undefined ? `, ${pin.profile}` : ''} · {sideOf(pin)}</span>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
