import type { Net } from '../../rules/model/index.ts';
import { DEFAULT_WIRING_CAPACITANCE } from '../../rules/model/index.ts';
import { formatMargin, formatQuantity } from '../../rules/levels/index.ts';
import {
  removeWaiverAt,
  setNetLabel,
  setNetMaxRiseTime,
  setNetPull,
  setNetWiringCapacitance,
} from '../store/commands/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { OptionalQuantityField, QuantityField, TextField } from './Field.tsx';
import { NetAnalysis } from './NetAnalysis.tsx';
import { NetLadder } from './NetLadder.tsx';

/** A pull-up or pull-down a net gets when one is first chosen: a common starting value, there to be edited. */
const FIRST_PULL_OHMS = 10e3;

function margin(v: number | null | undefined): string {
  return v === null || v === undefined ? '—' : formatMargin(v);
}

/** A net's label, pull resistor, wiring capacitance, rise-time limit, waivers, pins and level analysis. */
export function NetDetails({ net }: { net: Net }) {
  const store = useEditorStore();
  const rails = useEditor((s) => s.design.rails);
  const scenarios = useEditor((s) => s.result.states);
  const defaultCap = useEditor((s) => s.design.settings?.defaultWiringCapacitance ?? DEFAULT_WIRING_CAPACITANCE);
  const high = useEditor((s) => s.result.nets.get(s.powerState)?.get(net.id)?.view.analysis.worstHigh);
  const low = useEditor((s) => s.result.nets.get(s.powerState)?.get(net.id)?.view.analysis.worstLow);
  const apply = store.getState().apply;
  const pullTo = net.pull?.to ?? '';
  const stateLabel = (id: string | undefined) =>
    id === undefined ? 'every power state' : (scenarios.find((s) => s.id === id)?.label ?? id);
  return (
    <div className="rc-net-details" data-testid="net-details">
      <h3>
        Net <span className="rc-chip-id">{net.id}</span>
      </h3>
      <TextField
        label="Label"
        value={net.label ?? ''}
        testId="net-label"
        onCommit={(t) => apply(setNetLabel(net.id, t))}
      />
      <div className="rc-two">
        <label className="rc-field">
          <span className="rc-field-label">Pull resistor to</span>
          <select
            value={pullTo}
            data-testid="net-pull-to"
            onChange={(e) =>
              apply(
                setNetPull(
                  net.id,
                  e.target.value === '' ? null : { to: e.target.value, ohms: net.pull?.ohms ?? FIRST_PULL_OHMS },
                ),
              )
            }
          >
            <option value="">none</option>
            <option value="ground">ground</option>
            {rails.map((r) => (
              <option key={r.id} value={r.id}>
                {r.label}
              </option>
            ))}
          </select>
        </label>
        {net.pull !== undefined && (
          <QuantityField
            label="Pull resistance"
            unit="Ω"
            value={net.pull.ohms}
            testId="net-pull-ohms"
            onCommit={(ohms) => apply(setNetPull(net.id, { to: pullTo, ohms }))}
          />
        )}
      </div>
      <div className="rc-two">
        <OptionalQuantityField
          label="Wiring capacitance"
          unit="F"
          value={net.wiringCapacitance}
          testId="net-wiring-c"
          placeholder={`${formatQuantity(defaultCap, 'F')} (design default)`}
          title="The net's own wiring capacitance; empty: the design's default"
          onCommit={(c) => apply(setNetWiringCapacitance(net.id, c))}
        />
        <OptionalQuantityField
          label="Max rise time"
          unit="s"
          value={net.maxRiseTime}
          testId="net-rise"
          placeholder="no limit"
          title="The slowest acceptable rise time; empty: no limit"
          onCommit={(t) => apply(setNetMaxRiseTime(net.id, t))}
        />
      </div>
      <dl className="rc-margins">
        <dt>Worst high margin</dt>
        <dd>{margin(high)}</dd>
        <dt>Worst low margin</dt>
        <dd>{margin(low)}</dd>
      </dl>
      <h4 className="rc-sub">Waivers</h4>
      {net.waivers === undefined || net.waivers.length === 0 ? (
        <p className="rc-muted rc-tight">None. Accept a finding from its row in the findings list.</p>
      ) : (
        <ul className="rc-waivers" data-testid="net-waivers">
          {net.waivers.map((w, k) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: two waivers may share rule and state; the index only tells them apart
            <li key={`${w.rule}:${w.scenario ?? ''}:${k}`} data-rule={w.rule}>
              <span className="rc-waiver-what">
                <b>{w.rule}</b> · {stateLabel(w.scenario)}
              </span>
              <span className="rc-waiver-note">{w.note}</span>
              <button
                type="button"
                className="rc-icon-btn"
                aria-label={`Withdraw the waiver of ${w.rule}`}
                onClick={() => apply(removeWaiverAt(net.id, k))}
              >
                ×
              </button>
            </li>
          ))}
        </ul>
      )}
      <NetAnalysis net={net.id} />
      <NetLadder net={net.id} />
      <h4 className="rc-sub">Pins</h4>
      <ul className="rc-pin-list">
        {net.pins.map((p) => (
          <li key={p}>
            <span className="rc-pin-name">{p}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}
