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
