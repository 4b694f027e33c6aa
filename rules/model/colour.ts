/**
 * The grammar of a rail's `colour`: `#rgb` or `#rrggbb`, hexadecimal digits of either case,
 * nothing else. The editor puts the colour into a CSS property; a wider grammar (named
 * colours, functions) would let a file put `url(...)` or `var(...)` there, which makes the
 * browser fetch or resolve what the file chooses. Six or three hex digits are all the colour
 * picker writes and all the PDF writer reads.
 */
export const RAIL_COLOUR_PATTERN = '^#(?:[0-9a-fA-F]{3}|[0-9a-fA-F]{6})$';

const RAIL_COLOUR = new RegExp(RAIL_COLOUR_PATTERN);

/** True for a colour of the grammar above. */
export function isRailColour(value: unknown): value is string {
  return typeof value === 'string' && RAIL_COLOUR.test(value);
}

/** `#rrggbb` for a valid colour (`#abc` becomes `#aabbcc`), undefined otherwise. */
export function longRailColour(value: unknown): string | undefined {
  if (!isRailColour(value)) return undefined;
  if (value.length === 7) return value.toLowerCase();
  return `#${[...value.slice(1)].map((c) => c + c).join('')}`.toLowerCase();
}
