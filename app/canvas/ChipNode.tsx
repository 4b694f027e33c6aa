/**
 * A chip on the canvas: a header with designator, label, rail (in the rail's colour) and
 * family; one row per pin with its handle on the side the design gives. Names are rendered
 * as text, never as markup.
 */
import { memo, useEffect, useRef, type CSSProperties } from 'react';
import { Handle, Position, useUpdateNodeInternals, type NodeProps } from '@xyflow/react';
import type { Pin } from '../../rules/model/schema.ts';
import { formatQuantity } from '../../rules/levels/units.ts';
import { resolveProfile } from '../../rules/profiles/index.ts';
import { useEditor } from '../store/EditorProvider.tsx';
import { pinLayout, type Side } from './chipLayout.ts';
import type { ChipNode as ChipNodeType } from './deriveFlow.ts';
import { GLYPH_TEXT, glyphKind, PinGlyph } from './PinGlyph.tsx';

const POSITION: Readonly<Record<Side, Position>> = { left: Position.Left, right: Position.Right, top: Position.Top, bottom: Position.Bottom };

function railStyle(colour: string | undefined): CSSProperties {
  return { '--rail': colour ?? 'var(--rail-default)' } as CSSProperties;
}

const PinRow = memo(function PinRow({ pin, side, partRail }: { pin: Pin; side: Side; partRail: string }) {
  const kind = glyphKind(pin);
  const ownRail = pin.rail !== undefined && pin.rail !== partRail ? pin.rail : undefined;
  const rail = useEditor((s) => (ownRail === undefined ? undefined : s.design.rails.find((r) => r.id === ownRail)));
  const detail = [GLYPH_TEXT[kind], ownRail === undefined ? '' : `on rail ${rail?.label ?? ownRail}`, pin.profile === undefined ? '' : `profile ${pin.profile}`];
  return (
    <div className={`rc-pin rc-pin--${side}`} data-pin={pin.id} title={`${pin.id}: ${detail.filter((t) => t !== '').join(', ')}`}>
      <Handle type="source" position={POSITION[side]} id={pin.id} className="rc-handle" />
      <PinGlyph kind={kind} side={side} />
      <span className="rc-pin-name">{pin.id}</span>
      {ownRail !== undefined && <span className="rc-pin-rail" style={railStyle(rail?.colour)} aria-label={`rail ${rail?.label ?? ownRail}`} />}
    </div>
  );
});

function ChipNodeView({ id, data, selected }: NodeProps<ChipNodeType>) {
  const { part } = data;
  const rail = useEditor((s) => s.design.rails.find((r) => r.id === part.rail));
  const family = useEditor((s) => resolveProfile(s.design, part.profile)?.label ?? part.profile);
  const layout = pinLayout(part.pins);
  const rows = Math.max(layout.left.length, layout.right.length);

  // A part whose pins changed needs its handles measured again; the first measure is React Flow's own.
  const updateNodeInternals = useUpdateNodeInternals();
  const mounted = useRef(false);
  useEffect(() => {
    if (mounted.current) updateNodeInternals(id);
    mounted.current = true;
  }, [id, part.pins, updateNodeInternals]);

  return (
    <div className={`rc-chip${selected ? ' rc-chip--selected' : ''}`} style={railStyle(rail?.colour)} data-part={id}>
      {layout.top.length > 0 && (
        <div className="rc-strip rc-strip--top">
          {layout.top.map((p) => <PinRow key={p.id} pin={p} side="top" partRail={part.rail} />)}
        </div>
      )}
      <div className="rc-chip-head">
        <div className="rc-chip-title">
          <span className="rc-chip-id">{id}</span>
          <span className="rc-chip-label">{part.label}</span>
        </div>
        <div className="rc-chip-sub">
          <span className="rc-rail-badge" title={`rail ${rail?.label ?? part.rail} (${part.rail})`}>
            {rail === undefined ? part.rail : formatQuantity(rail.nominal, 'V')}
          </span>
          <span className="rc-chip-family">{family}</span>
        </div>
      </div>
      {rows > 0 && (
        <div className="rc-chip-body">
          <div className="rc-col rc-col--left">
            {layout.left.map((p) => <PinRow key={p.id} pin={p} side="left" partRail={part.rail} />)}
          </div>
          <div className="rc-col rc-col--right">
            {layout.right.map((p) => <PinRow key={p.id} pin={p} side="right" partRail={part.rail} />)}
          </div>
        </div>
      )}
      {layout.bottom.length > 0 && (
        <div className="rc-strip rc-strip--bottom">
          {layout.bottom.map((p) => <PinRow key={p.id} pin={p} side="bottom" partRail={part.rail} />)}
        </div>
      )}
    </div>
  );
}

export const ChipNode = memo(ChipNodeView);
