/**
 * A part between chips on the canvas (design format version 2): a small symbol of our own, its
 * designator and value (`4k7 ±1 %`, `Q1 ≤1 V`, `D1 ≤450 mV`), and a handle per pin. A resistor's
 * end tied to a rail or ground shows the rail's name instead of a handle.
 */
import { memo } from 'react';
import { Handle, Position, type NodeProps } from '@xyflow/react';
import type { Discrete } from '../../rules/model/index.ts';
import { discreteValue } from '../../rules/report/index.ts';
import { useEditor } from '../store/EditorProvider.tsx';
import type { DiscreteNode as DiscreteNodeType } from './deriveFlow.ts';

export { discreteValue };

/** Pin names and their sides: the first on the left, the second on the right. */
const ENDS: Readonly<Record<Discrete['kind'], readonly [string, string]>> = {
  resistor: ['1', '2'],
  'fet-shifter': ['S', 'D'],
  'diode-shifter': ['K', 'A'],
};

/** Our symbols, 64 × 24, drawn from the two pins inwards. */
function PartSymbol({ kind }: { kind: Discrete['kind'] }) {
  if (kind === 'resistor') {
    // A capsule with three cross bars: ours, not a zigzag and not a plain box.
    return (
      <svg className="rc-discrete-symbol" viewBox="0 0 64 24" width="64" height="24" aria-hidden="true">
        <path d="M0 12H14M50 12H64" />
        <rect x="14" y="6" width="36" height="12" rx="6" />
        <path d="M24 6V18M32 6V18M40 6V18" />
      </svg>
    );
  }
  if (kind === 'fet-shifter') {
    // A channel bar between two leads, a gate stub above it and a two-way arrow below.
    return (
      <svg className="rc-discrete-symbol" viewBox="0 0 64 24" width="64" height="24" aria-hidden="true">
        <path d="M0 14H20M44 14H64M20 14V10H44V14M32 10V2M24 20H40M24 20L27 18M24 20L27 22M40 20L37 18M40 20L37 22" />
      </svg>
    );
  }
  // A filled wedge pointing from the anode (right) to the cathode (left) against a bar.
  return (
    <svg className="rc-discrete-symbol" viewBox="0 0 64 24" width="64" height="24" aria-hidden="true">
      <path d="M0 12H24M40 12H64M24 5V19" />
      <path className="rc-discrete-fill" d="M40 5L25 12L40 19Z" />
    </svg>
  );
}

function DiscreteNodeView({ id, selected }: NodeProps<DiscreteNodeType>) {
  const d = useEditor((s) => s.design.discretes?.find((x) => x.id === id));
  if (d === undefined) return null;
  const [left, right] = ENDS[d.kind];
  const tie = d.kind === 'resistor' ? d.tie : undefined;
  const end = (pin: string, position: Position) =>
    tie?.[pin as '1' | '2'] !== undefined ? (
      <span
        className={`rc-discrete-tie rc-discrete-tie--${position}`}
        title={`${id}.${pin} tied to ${tie[pin as '1' | '2']}`}
      >
        {tie[pin as '1' | '2']}
      </span>
    ) : (
      <Handle type="source" position={position} id={pin} className="rc-handle" title={`${id}.${pin}`} />
    );
  const gate = d.kind === 'fet-shifter' ? d.gate : undefined;
  return (
    <div
      className={`rc-discrete${selected ? ' rc-discrete--selected' : ''}`}
      data-discrete={id}
      data-kind={d.kind}
      title={`${id}${d.label === undefined ? '' : `: ${d.label}`} (${d.kind})`}
    >
      {end(left, Position.Left)}
      <div className="rc-discrete-body">
        <div className="rc-discrete-head">
          <span className="rc-chip-id">{id}</span>
          {gate !== undefined && <span className="rc-discrete-gate">gate {gate}</span>}
        </div>
        <PartSymbol kind={d.kind} />
        <div className="rc-discrete-value" data-testid={`value-${id}`}>
          {discreteValue(d)}
        </div>
      </div>
      {end(right, Position.Right)}
    </div>
  );
}

export const DiscreteNode = memo(DiscreteNodeView);
