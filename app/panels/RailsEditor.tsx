import {
  addRail,
  deleteRail,
  setRailColour,
  setRailLabel,
  setRailTolerance,
  setRailVoltage,
} from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { DEFAULT_TOLERANCE } from '../../rules/model/index.ts';
import { longRailColour } from '../../rules/model/index.ts';
import { QuantityField, TextField } from './Field.tsx';
import { formatPercent, parsePercent } from './percent.ts';

/** Each rail's label, nominal voltage, tolerance and colour. */
export function RailsEditor() {
  const store = useEditorStore();
  const rails = useEditor((s) => s.design.rails);
  const apply = store.getState().apply;
  return (
    <div className="rc-rails">
      {rails.map((r) => (
        <div key={r.id} className="rc-rail-row" data-rail={r.id}>
          <div className="rc-rail-top">
            <input
              type="color"
              aria-label={`Colour of rail ${r.label}`}
              value={longRailColour(r.colour) ?? '#888888'}
              onChange={(e) => apply(setRailColour(r.id, e.target.value))}
            />
            <TextField
              label={`Label of rail ${r.id}`}
              quiet
              value={r.label}
              testId={`rail-label-${r.id}`}
              onCommit={(t) => apply(setRailLabel(r.id, t))}
            />
            {/* The id the file and the other rails' references use: shown, since a person editing the file needs it. */}
            <code className="rc-rail-id" title="This rail's id in the design file" data-testid={`rail-id-${r.id}`}>
              {r.id}
            </code>
            <button
              type="button"
              className="rc-icon-btn"
              aria-label={`Delete rail ${r.label}`}
              title="Delete this rail (only when nothing uses it)"
              onClick={() => apply(deleteRail(r.id))}
            >
              ×
            </button>
          </div>
          <div className="rc-rail-nums">
            <QuantityField
              label="Nominal"
              unit="V"
              value={r.nominal}
              testId={`rail-nominal-${r.id}`}
              onCommit={(v) => apply(setRailVoltage(r.id, v))}
            />
            <QuantityField
              label="Tolerance"
              // Shown and typed in percent (± 5 %), kept as a fraction in the file: format and parse say so.
              unit="V"
              value={r.tolerance ?? DEFAULT_TOLERANCE}
              testId={`rail-tolerance-${r.id}`}
              format={formatPercent}
              parse={(text) => parsePercent(text, r.nominal)}
              onCommit={(v) => apply(setRailTolerance(r.id, v))}
            />
          </div>
          {(r.min !== undefined || r.max !== undefined) && (
            <div className="rc-muted">
              Explicit range in the file: {r.min ?? '…'} – {r.max ?? '…'} V wins over the tolerance.
            </div>
          )}
        </div>
      ))}
      <button type="button" className="rc-add" onClick={() => apply(addRail())}>
        Add a rail
      </button>
    </div>
  );
}
