/**
 * Below FAR_ZOOM, chips and wires are drawn without their text (names, glyphs, net labels):
 * 11 px type is under 5 px there, and the page has a third of the elements to paint. Below
 * TINY_ZOOM (the whole of a large design in view) a chip is a box in its rail's colour: its
 * pins, a pixel or two wide, are not painted at all (they keep their places for the wires).
 */
export const FAR_ZOOM = 0.45;
export const TINY_ZOOM = 0.2;

/** 0 near, 1 far, 2 tiny: one number, so that a zoom changes a chip only when it crosses a threshold. */
export function zoomTier(zoom: number): 0 | 1 | 2 {
  return zoom < TINY_ZOOM ? 2 : zoom < FAR_ZOOM ? 1 : 0;
}
