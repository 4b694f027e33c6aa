import { ALL_ON_LABEL } from '../../rules/engine/index.ts';
import { addPowerState, deletePowerState, setPowerStateLabel, setRailOff } from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { TextField } from './Field.tsx';

/** The power states besides "all rails on", and which rails each turns off. */
export function PowerStatesEditor() {
  const store = useEditorStore();
  const scenarios = useEditor((s) => s.design.scenarios);
  const rails = useEditor((s) => s.design.rails);
  const apply = store.getState().apply;
  return (
    <div className="rc-states">
      <p className="rc-muted">“{ALL_ON_LABEL}” is always checked. Each state below turns some rails off.</p>
      {(scenarios ?? []).map((sc) => (
        <div key={sc.id} className="rc-state-row" data-state={sc.id}>
          <div className="rc-rail-top">
            <TextField
              label={`Name of power state ${sc.id}`}
              quiet
              value={sc.label}
              onCommit={(t) => apply(setPowerStateLabel(sc.id, t))}
            />
            <button
              type="button"
              className="rc-icon-btn"
              aria-label={`Delete power state ${sc.label}`}
              onClick={() => apply(deletePowerState(sc.id))}
            >
              ×
            </button>
          </div>
          <fieldset className="rc-off">
            <legend>Rails off</legend>
            {rails.map((r) => (
              <label key={r.id}>
                <input
                  type="checkbox"
                  checked={sc.off.includes(r.id)}
                  onChange={(e) => apply(setRailOff(sc.id, r.id, e.target.checked))}
                />
                {r.label}
              </label>
            ))}
          </fieldset>
        </div>
      ))}
      <button type="button" className="rc-add" onClick={() => apply(addPowerState())}>
        Add a power state
      </button>
    </div>
  );
}
