/**
 * Below this zoom, chips and wires are drawn without their text (names, glyphs, net labels):
 * 11 px type is under 5 px there, and the page has a third of the elements to paint.
 */
export const FAR_ZOOM = 0.45;
