/**
 * A rail's colour as the style of a chip or a swatch. The colour comes from a design file, so
 * only the format's grammar (`#rgb`, `#rrggbb`: rules/model/colour.ts) ever reaches a CSS
 * property; anything else (`url(...)`, `var(...)`, a named colour from an old file) falls back
 * to the default rail colour, and the reader and the colour command refuse it with a message.
 */
import type { CSSProperties } from 'react';
import { isRailColour } from '../../rules/model/index.ts';

export function railStyle(colour: string | undefined): CSSProperties {
  return { '--rail': isRailColour(colour) ? colour : 'var(--rail-default)' } as CSSProperties;
}
