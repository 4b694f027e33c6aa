/** The key to the pin glyphs and wire styles, folded away until asked for. */
import { useState } from 'react';
import { GLYPH_TEXT, PinGlyph, type GlyphKind } from './PinGlyph.tsx';
import { SeverityGlyph } from './SeverityGlyph.tsx';

const KINDS = Object.keys(GLYPH_TEXT) as GlyphKind[];

export function Legend() {
  const [open, setOpen] = useState(false);
  return (
    <div className={`rc-legend${open ? ' rc-legend--open' : ''}`}>
      <button type="button" className="rc-legend-toggle" aria-expanded={open} onClick={() => setOpen(!open)}>
        {open ? 'Hide key' : 'Key'}
      </button>
      {open && (
        <div className="rc-legend-body">
          <div className="rc-legend-title">Pins (on a right-hand side)</div>
          <ul>
            {KINDS.map((k) => (
              <li key={k}>
                <PinGlyph kind={k} side="right" />
                <span>{GLYPH_TEXT[k]}</span>
              </li>
            ))}
          </ul>
          <div className="rc-legend-title">Wires</div>
          <ul>
            <li>
              <svg width="34" height="10" aria-hidden="true">
                <path d="M1 5 H33" className="rc-key-wire--case" />
                <path d="M1 5 H33" className="rc-key-wire rc-key-wire--error" />
              </svg>
              <SeverityGlyph severity="error" />
              <span>error: heavy red, cased</span>
            </li>
            <li>
              <svg width="34" height="10" aria-hidden="true">
                <path d="M1 5 H33" className="rc-key-wire rc-key-wire--warning" />
                <path d="M1 5 H33" className="rc-key-wire--core" />
              </svg>
              <SeverityGlyph severity="warning" />
              <span>warning: amber double line</span>
            </li>
            <li>
              <svg width="34" height="10" aria-hidden="true">
                <path d="M1 5 H33" className="rc-key-wire rc-key-wire--clean" />
              </svg>
              <span>no error or warning</span>
            </li>
          </ul>
        </div>
      )}
    </div>
  );
}
