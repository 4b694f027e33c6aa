/**
 * A chip's measures in canvas units, kept once for the editor (app/canvas/chipLayout.ts, which
 * also hands them to styles.css as custom properties) and the PDF diagram
 * (rules/report/pdf/diagramLayout.ts): parts the editor shows apart are apart on paper too.
 */

/** A chip's width. */
export const CHIP_WIDTH = 208;
/** The rail-coloured top border and the header below it. */
export const HEADER_HEIGHT = 44;
/** The rail-coloured top border, inside HEADER_HEIGHT. */
export const TOP_BORDER = 3;
/** One row of left and right pins. */
export const ROW_HEIGHT = 20;
/** A row of top or bottom pins. */
export const STRIP_HEIGHT = 30;
/** Padding above and below the pin rows together (half above, half below). */
export const BODY_PADDING = 6;
/** The chip's other borders (sides and bottom). */
export const BOTTOM_BORDER = 1;
/** The drawn size of a part between chips: its symbol, designator and value. */
export const DISCRETE_SIZE = { width: 120, height: 64 } as const;
