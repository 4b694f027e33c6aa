/**
 * What the wire router works on, in canvas units: part bodies as rectangles with their pin
 * anchors, and wires as pin pairs of a net. The editor and the PDF diagram each measure their
 * own boxes and hand them here, so that both draw routes made by one router.
 */
export type Side = 'left' | 'right' | 'top' | 'bottom';

export interface Point {
  readonly x: number;
  readonly y: number;
}

export interface Anchor {
  /** `PART.PIN` */
  readonly key: string;
  readonly side: Side;
  /** On the box's edge. */
  readonly x: number;
  readonly y: number;
}

export interface Box {
  /** The part's id. */
  readonly id: string;
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
  readonly pins: readonly Anchor[];
}

export interface WireSpec {
  readonly id: string;
  readonly net: string;
  /** Pin keys. */
  readonly a: string;
  readonly b: string;
}

/** A routed wire: its polyline from pin `a` to pin `b`, each segment horizontal or vertical. */
export interface Route {
  readonly id: string;
  readonly net: string;
  readonly points: readonly Point[];
}
