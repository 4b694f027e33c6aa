export * from './types.ts';
export {
  BoxIndex,
  CHANNEL,
  CLEARANCE,
  normalOf,
  routePoints,
  routeWire,
  spreadChannels,
  STUB,
  type BodyRect,
  type PinAt,
} from './channels.ts';
export { WireRouter, routeOnce, type RouteUpdate } from './wireRouter.ts';
export {
  markRoutes,
  crossIndex,
  hopsOf,
  junctionsOf,
  svgPath,
  hopPolyline,
  HOP,
  MAX_HOPS,
  type CrossIndex,
  type Hop,
  type Marks,
} from './marks.ts';
export {
  sharedTracks,
  bodyCrossings,
  pathPoints,
  type DrawnWire,
  type SharedTrack,
  type BodyCrossing,
} from './measure.ts';
export { nudge, tidy, SPACING } from './nudge.ts';
export {
  BODY_PADDING,
  BOTTOM_BORDER,
  CHIP_WIDTH,
  DISCRETE_SIZE,
  HEADER_HEIGHT,
  ROW_HEIGHT,
  STRIP_HEIGHT,
  TOP_BORDER,
} from './chipMeasures.ts';
