/**
 * The pin glyph: one shape per `role` and `drive`, pointing along the signal's direction
 * relative to the chip (into it for an input, out of it for an output, both ways for a bidir
 * pin). Our own set: a filled head drives both levels, a bar across the base means it can let
 * go (three-state), a hollow head over a ground stroke means it only pulls low (open-drain).
 */
import { memo } from 'react';
import type { Pin } from '../../rules/model/index.ts';
import type { Side } from './chipLayout.ts';
import { driveOf } from '../../rules/model/index.ts';

export type GlyphKind = 'in' | 'out-pp' | 'out-ts' | 'out-od' | 'bi-ts' | 'bi-pp' | 'bi-od';

/** The glyph of a pin, with the format's defaults for `drive` (push-pull for outputs, three-state for bidir). */
export function glyphKind(pin: Pick<Pin, 'role' | 'drive'>): GlyphKind {
  if (pin.role === 'input') return 'in';
  const drive = driveOf(pin);
  const head = pin.role === 'output' ? 'out' : 'bi';
  return `${head}-${drive === 'push-pull' ? 'pp' : drive === 'three-state' ? 'ts' : 'od'}` as GlyphKind;
}

export const GLYPH_TEXT: Readonly<Record<GlyphKind, string>> = {
  in: 'input',
  'out-pp': 'output, push-pull: drives high and low',
  'out-ts': 'output, three-state: drives, or lets go',
  'out-od': 'output, open-drain: pulls low only; a resistor makes the high',
  'bi-pp': 'bidirectional, push-pull',
  'bi-ts': 'bidirectional, three-state',
  'bi-od': 'bidirectional, open-drain (a two-wire bus pin)',
};

/** The head, drawn pointing right (outward for a right-side pin) and turned for the other sides. */
function head(kind: GlyphKind) {
  switch (kind) {
    case 'in':
      return <path d="M3 2 L10 6 L3 10" className="g-line" />;
    case 'out-pp':
      return <path d="M3 1.5 L11 6 L3 10.5 Z" className="g-fill" />;
    case 'out-ts':
      return (
        <>
          <path d="M4.5 2 L11 6 L4.5 10 Z" className="g-fill" />
          <path d="M1.5 1.5 V10.5" className="g-line" />
        </>
      );
    case 'out-od':
      return <path d="M3.5 1.5 L9.5 5 L3.5 8.5 Z" className="g-hollow" />;
    case 'bi-pp':
      return <path d="M6.5 1 L12 6 L6.5 11 L1 6 Z" className="g-fill" />;
    case 'bi-ts':
      return (
        <>
          <path d="M6.5 1 L12 6 L6.5 11 L1 6 Z" className="g-fill" />
          <path d="M3.2 6 H9.8" className="g-cut" />
        </>
      );
    case 'bi-od':
      return <path d="M6.5 1.2 L10.5 5 L6.5 8.8 L2.5 5 Z" className="g-hollow" />;
  }
}

/** Outputs point away from the chip and inputs into it, so the drawing turns with the side. */
const ROTATE: Readonly<Record<Side, number>> = { right: 0, left: 180, top: -90, bottom: 90 };

export const PinGlyph = memo(function PinGlyph({ kind, side }: { kind: GlyphKind; side: Side }) {
  const turn = kind === 'in' ? ROTATE[side] + 180 : ROTATE[side];
  const od = kind === 'out-od' || kind === 'bi-od';
  return (
    <svg className={`rc-glyph rc-glyph--${kind}`} viewBox="0 0 13 12" width="13" height="12" aria-hidden="true">
      {/* An open-drain head sits higher, over a ground stroke that stays level whatever the side. */}
      <g transform={`rotate(${turn} 6.5 ${od ? 5 : 6})`}>{head(kind)}</g>
      {od && <path d="M2 11.2 H11" className="g-line" />}
    </svg>
  );
});
