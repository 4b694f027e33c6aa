import type { Net } from '../../rules/model/schema.ts';
import { formatQuantity } from '../../rules/levels/units.ts';
import { setNetLabel, setNetPull } from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { QuantityField, TextField } from './Field.tsx';

/** A pull-up or pull-down a net gets when one is first chosen: a common starting value, there to be edited. */
const FIRST_PULL_OHMS = 10e3;

function margin(v: number | null | undefined): string {
  return v === null || v === undefined ? '—' : formatQuantity(v, 'V');
}

/** A net's label and pull resistor, its pins and its worst margins in the chosen power state. */
export function NetDetails({ net }: { net: Net }) {
  const store = useEditorStore();
  const rails = useEditor((s) => s.design.rails);
  const high = useEditor((s) => s.result.nets.get(s.powerState)?.get(net.id)?.view.analysis.worstHigh);
  const low = useEditor((s) => s.result.nets.get(s.powerState)?.get(net.id)?.view.analysis.worstLow);
  const apply = store.getState().apply;
  const pullTo = net.pull?.to ?? '';
  return (
    <div className="rc-net-details" data-testid="net-details">
      <h3>Net <span className="rc-chip-id">{net.id}</span></h3>
      <TextField label="Label" value={net.label ?? ''} testId="net-label" onCommit={(t) => apply(setNetLabel(net.id, t))} />
      <label className="rc-field">
        <span className="rc-field-label">Pull resistor to</span>
        <select value={pullTo} data-testid="net-pull-to"
          onChange={(e) => apply(setNetPull(net.id, e.target.value === '' ? null : { to: e.target.value, ohms: net.pull?.ohms ?? FIRST_PULL_OHMS }))}>
          <option value="">none</option>
          <option value="ground">ground</option>
          {rails.map((r) => <option key={r.id} value={r.id}>{r.label}</option>)}
        </select>
      </label>
      {net.pull !== undefined && (
        <QuantityField label="Pull resistance" unit="Ω" value={net.pull.ohms} testId="net-pull-ohms"
          onCommit={(ohms) => apply(setNetPull(net.id, { to: pullTo, ohms }))} />
      )}
      <dl className="rc-margins">
        <dt>Worst high margin</dt><dd>{margin(high)}</dd>
        <dt>Worst low margin</dt><dd>{margin(low)}</dd>
      </dl>
      <div className="rc-sub">Pins</div>
      <ul className="rc-pin-list">
        {net.pins.map((p) => <li key={p}><span className="rc-pin-name">{p}</span></li>)}
      </ul>
    </div>
  );
}
