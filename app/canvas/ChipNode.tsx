/**
 * A chip on the canvas: a header with designator, label, rail (in the rail's colour) and
 * family; one row per pin with its handle on the side the design gives. Names are rendered
 * as text, never as markup. The chip reads its part from the store by id, so that an edit of
 * the part leaves React Flow's node objects alone. Zoomed far out, where no text can be read,
 * it draws only its outline, header and handles, at exactly the same size, so that wires keep
 * their ends and the browser has a fraction of the elements to paint.
 */
import { memo, useEffect, useRef } from 'react';
import { Handle, Position, useStore as useFlowStore, useUpdateNodeInternals, type NodeProps } from '@xyflow/react';
import type { Part, Pin, Rail } from '../../rules/model/index.ts';
import { formatQuantity } from '../../rules/levels/index.ts';
import { pullLabel, pullWords } from '../../rules/report/index.ts';
import { CHIP_LOOK } from '../store/canvasViews.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { useKeyed } from '../store/keyedView.ts';
import { pinLayout, type Side } from './chipLayout.ts';
import type { ChipNode as ChipNodeType } from './deriveFlow.ts';
import { zoomTier } from './farZoom.ts';
import { railStyle } from './railStyle.ts';
import { GLYPH_TEXT, glyphKind, PinGlyph } from './PinGlyph.tsx';

const POSITION: Readonly<Record<Side, Position>> = {
  left: Position.Left,
  right: Position.Right,
  top: Position.Top,
  bottom: Position.Bottom,
};

/** The swatch of a pin on a rail other than its part's: only such pins read the rails. */
function OwnRail({ id }: { id: string }) {
  const rail = useEditor((s) => s.design.rails.find((r) => r.id === id));
  return (
    <span
      className="rc-pin-rail"
      role="img"
      style={railStyle(rail?.colour)}
      aria-label={`rail ${rail?.label ?? id}`}
      title={`on rail ${rail?.label ?? id}`}
    />
  );
}

/**
 * What a pin's tooltip says: its kind, its pull (an internal one is easily forgotten), the rail
 * it runs on and the profile that sets its levels, by label with the id a person edits.
 */
export function pinTip(pin: Pin, partRail: string, partProfile: string, rails: readonly Rail[]): string {
  const railId = pin.rail ?? partRail;
  const rail = rails.find((r) => r.id === railId);
  return [
    `${pin.id}: ${GLYPH_TEXT[glyphKind(pin)]}`,
    pin.pull === undefined ? 'no pull of its own' : `internal ${pullWords(pin.pull, rails)}`,
    `rail ${rail === undefined ? railId : `${rail.label} (${rail.id})`}${pin.rail !== undefined && pin.rail !== partRail ? ", not its part's" : ''}`,
    `profile ${pin.profile ?? partProfile}${pin.profile !== undefined ? ' (its own)' : ''}`,
  ].join('\n');
}

const PinRow = memo(function PinRow({
  pin,
  side,
  partRail,
  partProfile,
}: {
  pin: Pin;
  side: Side;
  partRail: string;
  partProfile: string;
}) {
  const kind = glyphKind(pin);
  const rails = useEditor((s) => s.design.rails);
  const ownRail = pin.rail !== undefined && pin.rail !== partRail ? pin.rail : undefined;
  return (
    <div className={`rc-pin rc-pin--${side}`} data-pin={pin.id} title={pinTip(pin, partRail, partProfile, rails)}>
      <Handle type="source" position={POSITION[side]} id={pin.id} className="rc-handle" />
      <PinGlyph kind={kind} side={side} />
      <span className="rc-pin-name">{pin.id}</span>
      {pin.pull !== undefined && (
        <span className="rc-pin-pull" data-pin-pull>
          {pullLabel(pin.pull, rails).split(' ')[0]}
        </span>
      )}
      {ownRail !== undefined && <OwnRail id={ownRail} />}
    </div>
  );
});

/**
 * A pin as drawn far out: its handle, and its name kept for its width but never painted, so
 * that every handle stays exactly where React Flow measured it.
 */
function PinStub({ pin, side, partRail }: { pin: Pin; side: Side; partRail: string }) {
  return (
    <div className={`rc-pin rc-pin--${side}`} data-pin={pin.id}>
      <Handle type="source" position={POSITION[side]} id={pin.id} className="rc-handle" />
      <span className="rc-glyph-gap" />
      <span className="rc-pin-name">{pin.id}</span>
      {pin.rail !== undefined && pin.rail !== partRail && <span className="rc-pin-rail" />}
    </div>
  );
}

function Rows({
  pins,
  side,
  partRail,
  partProfile,
  far,
}: {
  pins: readonly Pin[];
  side: Side;
  partRail: string;
  partProfile: string;
  far: boolean;
}) {
  return (
    <>
      {pins.map((p) =>
        far ? (
          <PinStub key={p.id} pin={p} side={side} partRail={partRail} />
        ) : (
          <PinRow key={p.id} pin={p} side={side} partRail={partRail} partProfile={partProfile} />
        ),
      )}
    </>
  );
}

function Head({ id, part, rail, family }: { id: string; part: Part; rail: Rail | undefined; family: string }) {
  return (
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
  );
}

function ChipNodeView({ id, selected }: NodeProps<ChipNodeType>) {
  const { part, rail, family } = useKeyed(useEditorStore(), CHIP_LOOK, id);
  const tier = useFlowStore((s) => zoomTier(s.transform[2]));
  const far = tier > 0;

  // A part whose pins changed needs its handles measured again; the first measure is React Flow's own.
  const updateNodeInternals = useUpdateNodeInternals();
  const mounted = useRef(false);
  const pins = part?.pins;
  // biome-ignore lint/correctness/useExhaustiveDependencies: a new pins array is the very reason to measure the handles again
  useEffect(() => {
    if (mounted.current) updateNodeInternals(id);
    mounted.current = true;
  }, [id, pins, updateNodeInternals]);

  if (part === undefined) return null;
  const layout = pinLayout(part.pins);
  const rows = Math.max(layout.left.length, layout.right.length);
  return (
    <div
      className={`rc-chip${selected ? ' rc-chip--selected' : ''}${far ? ' rc-chip--far' : ''}${tier === 2 ? ' rc-chip--tiny' : ''}`}
      style={railStyle(rail?.colour)}
      data-part={id}
    >
      {layout.top.length > 0 && (
        <div className="rc-strip rc-strip--top">
          <Rows pins={layout.top} side="top" partRail={part.rail} partProfile={part.profile} far={far} />
        </div>
      )}
      {far ? (
        <div className="rc-chip-head">
          <span className="rc-chip-id">{id}</span>
        </div>
      ) : (
        <Head id={id} part={part} rail={rail} family={family} />
      )}
      {rows > 0 && (
        <div className="rc-chip-body">
          <div className="rc-col rc-col--left">
            <Rows pins={layout.left} side="left" partRail={part.rail} partProfile={part.profile} far={far} />
          </div>
          <div className="rc-col rc-col--right">
            <Rows pins={layout.right} side="right" partRail={part.rail} partProfile={part.profile} far={far} />
          </div>
        </div>
      )}
      {layout.bottom.length > 0 && (
        <div className="rc-strip rc-strip--bottom">
          <Rows pins={layout.bottom} side="bottom" partRail={part.rail} partProfile={part.profile} far={far} />
        </div>
      )}
    </div>
  );
}

export const ChipNode = memo(ChipNodeView);
