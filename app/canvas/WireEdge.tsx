/**
 * A wire: one pin pair of a net, drawn as right-angled segments. Its look comes from its
 * net's worst unwaived severity in the chosen power state, read by net id from the store
 * (not from the edge object, stack.md "React Flow at scale"): red, heavy and cased for an
 * error, an amber double line for a warning, thin and neutral when clean. Not dashed: a dash
 * pattern along a long wire costs the software rasteriser more than the rest of the canvas.
 */
import { memo, useContext, useState } from 'react';
import { useStore } from 'zustand';
import { svgPath, type Point } from '../../rules/routing/index.ts';
import { RouteContext } from './routeContext.ts';
import {
  BaseEdge,
  EdgeLabelRenderer,
  getSmoothStepPath,
  Position,
  useStore as useFlowStore,
  type EdgeProps,
} from '@xyflow/react';
import { formatMargin } from '../../rules/levels/index.ts';
import type { Pull } from '../../rules/model/index.ts';
import type { Finding, Severity } from '../../rules/engine/index.ts';
import { RULES } from '../../rules/checks/index.ts';
import { pullLabel, pullWords } from '../../rules/report/index.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { parseWireLook, WIRE_LOOK } from '../store/canvasViews.ts';
import { useKeyed } from '../store/keyedView.ts';
import type { WireEdge as WireEdgeType } from './deriveFlow.ts';
import { SeverityGlyph } from './SeverityGlyph.tsx';
import { zoomTier } from './farZoom.ts';

function margin(v: number | null | undefined): string {
  return v === null || v === undefined ? 'no pair' : formatMargin(v);
}

const RANK: Readonly<Record<Severity, number>> = { error: 3, warning: 2, info: 1 };
const RULE_TITLE = new Map(RULES.map((r) => [r.id, r.meta.title]));

/** The net's worst unwaived finding: the first of the highest severity, as the findings list orders them. */
function worstFinding(findings: readonly Finding[]): Finding | undefined {
  let best: Finding | undefined;
  for (const f of findings)
    if (f.waived === undefined && (best === undefined || RANK[f.severity] > RANK[best.severity])) best = f;
  return best;
}

/** What hovering a wire shows: the net's worst finding in words and its worst margins in the chosen power state. */
function WireTip({ net, x, y }: { net: string; x: number; y: number }) {
  const high = useEditor((s) => s.result.nets.get(s.powerState)?.get(net)?.view.analysis.worstHigh);
  const low = useEditor((s) => s.result.nets.get(s.powerState)?.get(net)?.view.analysis.worstLow);
  const count = useEditor(
    (s) =>
      s.result.nets
        .get(s.powerState)
        ?.get(net)
        ?.findings.filter((f) => f.waived === undefined).length ?? 0,
  );
  // Why the wire has its colour: its worst unwaived finding, in the rule's own words.
  const worst = useEditor((s) => worstFinding(s.result.nets.get(s.powerState)?.get(net)?.findings ?? []));
  const state = useEditor((s) => s.result.states.find((st) => st.id === s.powerState)?.label ?? s.powerState);
  return (
    <div
      className="rc-wire-tip"
      style={{ transform: `translate(-50%, calc(-100% - 14px)) translate(${x}px, ${y}px)` }}
      role="tooltip"
    >
      {worst !== undefined && (
        <div className={`rc-wire-tip-worst rc-wire-tip-worst--${worst.severity}`} data-worst={worst.rule}>
          <b>{RULE_TITLE.get(worst.rule) ?? worst.rule}</b>
          <span>{worst.message}</span>
        </div>
      )}
      <div className="rc-wire-tip-row">
        <span>worst high margin</span>
        <b data-margin="high">{margin(high)}</b>
      </div>
      <div className="rc-wire-tip-row">
        <span>worst low margin</span>
        <b data-margin="low">{margin(low)}</b>
      </div>
      <div className="rc-wire-tip-foot">
        {count === 0 ? 'no findings' : `${count} finding${count === 1 ? '' : 's'}`} · {state}
      </div>
    </div>
  );
}

/** A net's pull resistor beside its name: value and where it goes (`↑4K7 3.3 V`). */
function PullTag({ pull }: { pull: Pull }) {
  const rails = useEditor((s) => s.design.rails);
  return (
    <span className="rc-net-pull" data-pull title={pullWords(pull, rails)}>
      {pullLabel(pull, rails)}
    </span>
  );
}

/**
 * The net's name sits just off its first pin, above the wire, as a name is written beside a
 * pin on a schematic: mid-wire names pile up where wires share a channel.
 */
function labelPlace(x: number, y: number, side: Position): { transform: string } {
  switch (side) {
    case Position.Left:
      return { transform: `translate(-100%, -100%) translate(${x - 10}px, ${y - 1}px)` };
    case Position.Top:
      return { transform: `translate(4px, -100%) translate(${x}px, ${y - 6}px)` };
    case Position.Bottom:
      return { transform: `translate(4px, 0) translate(${x}px, ${y + 6}px)` };
    default:
      return { transform: `translate(0, -100%) translate(${x + 10}px, ${y - 1}px)` };
  }
}

/** How far a route's end may lie from the drawn pin and still be drawn (a top or bottom pin's handle sits where its strip's text puts it). */
const SNAP = 24;

/**
 * The route with its ends on the pins as React Flow has them; null when a pin is farther off
 * than a handle's placement explains (its chip is being dragged: the route is stale).
 */
function fitEnds(points: readonly Point[], sx: number, sy: number, tx: number, ty: number): Point[] | null {
  const n = points.length;
  if (n < 2) return null;
  const a = points[0]!;
  const b = points[n - 1]!;
  if (Math.abs(a.x - sx) > SNAP || Math.abs(a.y - sy) > SNAP || Math.abs(b.x - tx) > SNAP || Math.abs(b.y - ty) > SNAP)
    return null;
  if (a.x === sx && a.y === sy && b.x === tx && b.y === ty) return points as Point[];
  const out = points.map((p) => ({ x: p.x, y: p.y }));
  // Move each end and the corner after it along the end's run, so that every run stays straight.
  const shift = (end: number, next: number, x: number, y: number) => {
    const e = out[end]!;
    const c = out[next]!;
    if (n > 2 && e.x === c.x) c.x = x;
    if (n > 2 && e.y === c.y) c.y = y;
    out[end] = { x, y };
  };
  shift(0, 1, sx, sy);
  shift(n - 1, n - 2, tx, ty);
  return out;
}

function WireEdgeView(props: EdgeProps<WireEdgeType>) {
  const { id, data, selected, sourceX, sourceY, targetX, targetY, sourcePosition, targetPosition } = props;
  const net = data?.net ?? '';
  const { severity, rule, highlighted } = parseWireLook(useKeyed(useEditorStore(), WIRE_LOOK, net));
  const tier = useFlowStore((s) => zoomTier(s.transform[2]));
  const far = tier > 0;
  const tiny = tier === 2;
  const [hover, setHover] = useState(false);
  const routes = useContext(RouteContext);
  const route = useStore(routes, (s) => s.routes.get(id));
  // Hops only where they can be seen: zoomed out, a crossing is a pixel either way.
  const hops = useStore(routes, (s) => (far ? undefined : s.hops.get(id)));
  // The net's branch points, drawn once, by the wire that carries its name.
  const dots = useStore(routes, (s) => (data?.label != null ? s.junctions.get(net) : undefined));
  const fitted = route === undefined ? null : fitEnds(route.points, sourceX, sourceY, targetX, targetY);
  let path: string;
  let midX: number;
  let midY: number;
  if (fitted !== null) {
    path = svgPath(fitted, hops);
    const mid = fitted[Math.floor(fitted.length / 2)]!;
    [midX, midY] = [mid.x, mid.y];
  } else {
    // Not routed yet, or its chip is being dragged: straight runs from pin to pin until routed.
    [path, midX, midY] = getSmoothStepPath({
      sourceX,
      sourceY,
      targetX,
      targetY,
      sourcePosition,
      targetPosition,
      borderRadius: 3,
      offset: 14,
    });
  }
  const name = labelPlace(sourceX, sourceY, sourcePosition);

  const classes = [
    'rc-wire',
    `rc-wire--${severity}`,
    selected ? 'rc-wire--selected' : '',
    highlighted ? 'rc-wire--net' : '',
    tiny ? 'rc-wire--tiny' : '',
  ]
    .filter((c) => c !== '')
    .join(' ');
  return (
    // biome-ignore lint/a11y/noStaticElementInteractions: hover only shows the wire's summary, which the net's details panel gives to the keyboard too
    <g
      className={classes}
      data-net={net}
      data-severity={severity}
      data-rule={rule}
      data-routed={fitted !== null ? 'yes' : 'no'}
      onMouseEnter={far ? undefined : () => setHover(true)}
      onMouseLeave={() => setHover(false)}
    >
      {(selected || highlighted) && <path d={path} className="rc-wire-halo" fill="none" />}
      {(severity === 'error' || (severity === 'warning' && !tiny)) && (
        <path d={path} className="rc-wire-case" fill="none" />
      )}
      {/* Far out, a wire is too thin to aim at: no wide invisible twin to catch the pointer. */}
      <BaseEdge id={id} path={path} interactionWidth={far ? 0 : 14} />
      {dots?.map((p) => (
        <circle
          key={`${p.x},${p.y}`}
          className="rc-junction"
          cx={p.x}
          cy={p.y}
          r={tiny ? 5 : 3.2}
          data-junction={net}
        />
      ))}
      {!far && (data?.label != null || hover) && (
        <EdgeLabelRenderer>
          {data?.label != null && (
            <div
              className={`rc-net-label rc-net-label--${severity} nodrag nopan`}
              style={{ transform: name.transform }}
              data-net-label={net}
            >
              <SeverityGlyph severity={severity} size={11} />
              <span>{data.label}</span>
              {data.pull != null && <PullTag pull={data.pull} />}
            </div>
          )}
          {hover && <WireTip net={net} x={midX} y={midY} />}
        </EdgeLabelRenderer>
      )}
    </g>
  );
}

export const WireEdge = memo(WireEdgeView);
