/**
 * The details of a part between chips (version 2): its values, a resistor's tied ends, a FET's
 * gate rail, and every quantity the engine computed through it in the chosen power state, each
 * with the corner it was found at.
 */
import type { Discrete } from '../../rules/model/index.ts';
import { formatQuantity } from '../../rules/levels/index.ts';
import type { PairAnalysis, PathEdge } from '../../rules/engine/index.ts';
import { useMemo } from 'react';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { removeDiscrete, setDiscrete } from '../store/commands/index.ts';
import { QuantityField } from './Field.tsx';
import { discreteValue } from '../canvas/DiscreteNode.tsx';

const PINS: Readonly<Record<Discrete['kind'], readonly string[]>> = {
  resistor: ['1', '2'],
  'fet-shifter': ['S', 'D'],
  'diode-shifter': ['K', 'A'],
};

/** A detail key as the panel names it. */
function quantity(key: string, v: number): string {
  if (key.startsWith('R:')) return `${key.slice(2)} ${formatQuantity(v, 'Ω', 4)}`;
  const unit = key === 'iFar' || key === 'leakage' ? 'A' : key === 'rdsOn' || key === 'pullResistance' ? 'Ω' : 'V';
  return `${key} ${formatQuantity(v, unit, 4)}`;
}

function PairRow({ p }: { p: PairAnalysis }) {
  const side = (name: string, s: PairAnalysis['high']) =>
    s === null ? null : (
      <li>
        {name}: {formatQuantity(s.out, 'V', 4)} against {formatQuantity(s.threshold, 'V', 4)}, margin{' '}
        {formatQuantity(s.margin, 'V', 3)} (
        {s.driverVdd === null ? '' : `driver supply ${formatQuantity(s.driverVdd, 'V', 4)}, `}receiver supply{' '}
        {formatQuantity(s.receiverVdd, 'V', 4)}
        {s.detail === undefined
          ? ''
          : `; ${Object.entries(s.detail)
              .map(([k, v]) => quantity(k, v))
              .join(', ')}`}
        )
      </li>
    );
  return (
    <li data-testid="discrete-pair">
      {p.driver} → {p.receiver}
      <ul>
        {side('high', p.high)}
        {side('low', p.low)}
      </ul>
    </li>
  );
}

export function DiscreteDetails({ part }: { part: Discrete }) {
  const store = useEditorStore();
  const apply = store.getState().apply;
  const rails = useEditor((s) => s.design.rails);
  const table = useEditor((s) => s.result.nets.get(s.powerState));
  const nets = useEditor((s) => s.design.nets);
  const { pairs, edge } = useMemo(() => {
    const out: PairAnalysis[] = [];
    let slowest: PathEdge | undefined;
    for (const net of nets) {
      if (!PINS[part.kind].some((pin) => net.pins.includes(`${part.id}.${pin}`))) continue;
      const view = table?.get(net.id)?.view;
      for (const p of view?.analysis.pairs ?? []) if (p.via?.split('+').includes(part.id)) out.push(p);
      if (view?.pathEdge !== undefined && (slowest === undefined || view.pathEdge.riseTime > slowest.riseTime))
        slowest = view.pathEdge;
    }
    return { pairs: out, edge: slowest };
  }, [table, nets, part]);
  return (
    <div className="rc-part-details" data-testid="discrete-details">
      <h3>
        <span className="rc-chip-id">{part.id}</span> {part.label ?? part.kind} — {discreteValue(part)}
      </h3>
      {part.kind === 'resistor' && (
        <div className="rc-two">
          <QuantityField
            label="Resistance"
            unit="Ω"
            value={part.ohms}
            testId="discrete-ohms"
            onCommit={(v) => apply(setDiscrete(part.id, { ohms: v }))}
          />
          <QuantityField
            label="Tolerance (fraction)"
            unit="V"
            value={part.tolerance ?? 0.05}
            testId="discrete-tolerance"
            format={(v) => String(v)}
            parse={(t) => {
              const v = Number(t);
              return Number.isFinite(v) && v >= 0
                ? { ok: true, value: v }
                : { ok: false, error: 'expected a fraction, e.g. 0.01' };
            }}
            onCommit={(v) => apply(setDiscrete(part.id, { tolerance: v }))}
          />
          {(['1', '2'] as const).map((end) => (
            <label key={end} className="rc-field">
              <span className="rc-field-label">End {end} tied to</span>
              <select
                data-testid={`discrete-tie-${end}`}
                value={part.tie?.[end] ?? ''}
                onChange={(e) => {
                  const tie = { ...part.tie };
                  if (e.target.value === '') delete tie[end];
                  else tie[end] = e.target.value;
                  apply(setDiscrete(part.id, { tie: Object.keys(tie).length === 0 ? undefined : tie }));
                }}
              >
                <option value="">a net</option>
                <option value="ground">ground</option>
                {rails.map((r) => (
                  <option key={r.id} value={r.id}>
                    {r.label}
                  </option>
                ))}
              </select>
            </label>
          ))}
        </div>
      )}
      {part.kind === 'fet-shifter' && (
        <div className="rc-two">
          <label className="rc-field">
            <span className="rc-field-label">Gate rail</span>
            <select
              data-testid="discrete-gate"
              value={part.gate}
              onChange={(e) => apply(setDiscrete(part.id, { gate: e.target.value }))}
            >
              {rails.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.label}
                </option>
              ))}
            </select>
          </label>
          <QuantityField
            label="VGS(th) max"
            unit="V"
            value={part.vgsThMax}
            testId="discrete-vgs"
            onCommit={(v) => apply(setDiscrete(part.id, { vgsThMax: v }))}
          />
          <QuantityField
            label="RDS(on) max"
            unit="Ω"
            value={part.rdsOnMax}
            testId="discrete-rds"
            onCommit={(v) => apply(setDiscrete(part.id, { rdsOnMax: v }))}
          />
        </div>
      )}
      {part.kind === 'diode-shifter' && (
        <div className="rc-two">
          <QuantityField
            label="Vf max"
            unit="V"
            value={part.vfMax}
            testId="discrete-vf"
            onCommit={(v) => apply(setDiscrete(part.id, { vfMax: v }))}
          />
          <QuantityField
            label="Leakage max"
            unit="A"
            value={part.leakageMax}
            testId="discrete-leakage"
            onCommit={(v) => apply(setDiscrete(part.id, { leakageMax: v }))}
          />
        </div>
      )}
      <h4>Through {part.id}</h4>
      {pairs.length === 0 ? (
        <p className="rc-empty">No driver reaches a receiver through it in this power state.</p>
      ) : (
        <ul className="rc-discrete-pairs">
          {pairs.map((p) => (
            <PairRow key={`${p.driver}>${p.receiver}`} p={p} />
          ))}
        </ul>
      )}
      {edge !== undefined && (
        <p data-testid="discrete-edge">
          10–90 % edge from {edge.driver}: {formatQuantity(edge.riseTime, 's', 3)} (ln 9 ×{' '}
          {formatQuantity(edge.resistance, 'Ω', 4)} × {formatQuantity(edge.capacitance, 'F', 3)})
        </p>
      )}
      <button
        type="button"
        data-testid="discrete-delete"
        onClick={() => {
          apply(removeDiscrete(part.id));
          store.getState().select({ parts: [], wires: [], net: null });
        }}
      >
        Delete {part.id}
      </button>
    </div>
  );
}
