/**
 * The voltage ladder of one net in one power state, drawn as SVG from the `Ladder` model.
 * Readable without colour: every band and line carries its value in words, and pass, warning
 * and fail differ by pattern and by text. Each drawn number also sits in data attributes
 * (`data-kind`, `data-volts`, `data-pin`, …) so that tests can compare it with the engine.
 */
import { createContext, memo, useContext, useId } from 'react';
import type { Ladder, LadderDriver, LadderMargin, LadderReceiver } from '../../rules/report/index.ts';
import {
  BAND_WIDTH,
  DRIVER_WIDTH,
  RECEIVER_WIDTH,
  LANE_WIDTH,
  layoutLadder,
  marginVolts,
  separate,
  STATUS_TEXT,
  volts,
  type Lane,
  type LadderLayout,
} from './ladderLayout.ts';
import './ladder.css';

export interface VoltageLadderProps {
  readonly ladder: Ladder;
  /** Height of the drawing in px; the width follows from the number of pins and pairs. */
  readonly height?: number;
  readonly className?: string;
  /**
   * Scale the drawing down to the width of its container (never up), so that a narrow column
   * shows the whole ladder; by default it is drawn at its own size.
   */
  readonly fit?: boolean;
  /** A rail's name as people read it (its label); the id when not given. */
  readonly railName?: (id: string) => string;
}

/** Rails by the names the editor shows (one name for one thing), for the columns' captions. */
const RailName = createContext<(id: string) => string>((id) => id);

type Patterns = Readonly<Record<'undefined' | 'warning' | 'fail', string>>;

function Axis({ ladder, at }: { ladder: Ladder; at: LadderLayout }) {
  return (
    <g className="ladder-axis" data-kind="axis" data-top={ladder.top}>
      <line x1={56} x2={56} y1={at.y(0)} y2={at.y(ladder.top)} />
      {ladder.ticks.map((t) => (
        <g key={t} data-kind="tick" data-volts={t}>
          <line x1={52} x2={56} y1={at.y(t)} y2={at.y(t)} />
          <line className="ladder-grid" x1={56} x2={at.width - 8} y1={at.y(t)} y2={at.y(t)} />
          <text x={48} y={at.y(t) + 4} textAnchor="end">
            {volts(t)}
          </text>
        </g>
      ))}
    </g>
  );
}

/** Characters of the small caption that fit a column (11 px text, about 6.4 px a character). */
const fits = (width: number) => Math.floor((width - 24) / 6.4);

/** A caption cut to the column with an ellipsis; the whole text stays in its tooltip. */
function clip(text: string, width: number): string {
  const n = fits(width);
  return text.length <= n ? text : `${text.slice(0, Math.max(1, n - 1))}…`;
}

/** The pin, what it does, and its rail by name on a line of its own (a label can be long). */
function Header({ x, pin, sub, rail, width }: { x: number; pin: string; sub: string; rail: string; width: number }) {
  return (
    <g className="ladder-header">
      <text x={x} y={16}>
        {pin}
      </text>
      <text className="ladder-sub" x={x} y={31}>
        {clip(sub, width)}
        <title>{sub}</title>
      </text>
      <text className="ladder-sub" x={x} y={45} data-kind="rail-name" data-rail-name={rail}>
        {clip(rail, width)}
        <title>{rail}</title>
      </text>
    </g>
  );
}

function Labels({ x, items }: { x: number; items: readonly { y: number; text: string }[] }) {
  const ys = separate(items.map((i) => i.y));
  return (
    <>
      {items.map((item, k) => (
        <text key={item.text} x={x} y={ys[k]}>
          {item.text}
        </text>
      ))}
    </>
  );
}

function DriverColumn({ d, x, at }: { d: LadderDriver; x: number; at: LadderLayout }) {
  const bx = x + 12;
  const railName = useContext(RailName);
  const labels: { y: number; text: string }[] = [];
  if (d.high !== null) {
    labels.push({
      y: at.y(d.high.to) + 4,
      text: `${d.high.vpull === undefined ? 'VDD' : 'Vpull'} ${volts(d.high.to)}`,
    });
    labels.push({ y: at.y(d.high.from) + 4, text: `VOH ≥ ${volts(d.high.from)}${d.high.estimate ? ' (est.)' : ''}` });
  }
  if (d.low !== null)
    labels.push({ y: at.y(d.low.to) + 4, text: `VOL ≤ ${volts(d.low.to)}${d.low.estimate ? ' (est.)' : ''}` });
  return (
    <g className="ladder-driver" data-pin={d.pin}>
      <Header x={bx} pin={d.pin} sub={`drives · ${d.drive}`} rail={railName(d.rail)} width={DRIVER_WIDTH} />
      {d.high !== null && (
        <>
          <rect
            className="ladder-band ladder-band-high"
            x={bx}
            width={BAND_WIDTH}
            y={at.y(d.high.to)}
            height={Math.max(1, at.y(d.high.from) - at.y(d.high.to))}
            data-kind="voh"
            data-volts={d.high.from}
            data-pin={d.pin}
            data-estimate={d.high.estimate}
            data-load={d.high.load}
          >
            <title>{`${d.pin} guarantees ${volts(d.high.from)} or more when high`}</title>
          </rect>
          <line
            className="ladder-supply"
            x1={bx - 4}
            x2={bx + BAND_WIDTH + 4}
            y1={at.y(d.high.to)}
            y2={at.y(d.high.to)}
            data-kind={d.high.vpull === undefined ? 'driver-vdd' : 'vpull'}
            data-volts={d.high.to}
            data-pin={d.pin}
          />
        </>
      )}
      {d.low !== null && (
        <rect
          className="ladder-band ladder-band-low"
          x={bx}
          width={BAND_WIDTH}
          y={at.y(d.low.to)}
          height={Math.max(1, at.y(0) - at.y(d.low.to))}
          data-kind="vol"
          data-volts={d.low.to}
          data-pin={d.pin}
          data-estimate={d.low.estimate}
          data-load={d.low.load}
        >
          <title>{`${d.pin} guarantees ${volts(d.low.to)} or less when low`}</title>
        </rect>
      )}
      <Labels x={bx + BAND_WIDTH + 6} items={labels} />
    </g>
  );
}

function ReceiverColumn({
  r,
  x,
  at,
  patterns,
}: {
  r: LadderReceiver;
  x: number;
  at: LadderLayout;
  patterns: Patterns;
}) {
  const bx = x + 12;
  const railName = useContext(RailName);
  const ceiling = Math.max(r.viMax?.volts ?? r.railRange.max, r.vih?.volts ?? 0);
  const labels: { y: number; text: string }[] = [];
  if (r.viMax !== null) labels.push({ y: at.y(r.viMax.volts) + 4, text: `max ${volts(r.viMax.volts)}` });
  if (r.vih !== null) labels.push({ y: at.y(r.vih.volts) + 4, text: `VIH ${volts(r.vih.volts)}` });
  if (r.vil !== null) labels.push({ y: at.y(r.vil.volts) + 4, text: `VIL ${volts(r.vil.volts)}` });
  return (
    <g className="ladder-receiver" data-pin={r.pin}>
      <Header
        x={bx}
        pin={r.pin}
        sub={`receives · ${volts(r.railRange.min)}–${volts(r.railRange.max)}${r.schmitt ? ' · Schmitt' : ''}`}
        rail={railName(r.rail)}
        width={RECEIVER_WIDTH}
      />
      {r.vih !== null && r.vil !== null && r.vih.volts > r.vil.volts && (
        <rect
          className="ladder-zone-undefined"
          x={bx}
          width={BAND_WIDTH}
          y={at.y(r.vih.volts)}
          height={at.y(r.vil.volts) - at.y(r.vih.volts)}
          fill={`url(#${patterns.undefined})`}
          data-kind="undefined-zone"
        >
          <title>{`Between VIL and VIH ${r.pin} reads neither high nor low`}</title>
        </rect>
      )}
      {r.vih !== null && (
        <rect
          className="ladder-zone-high"
          x={bx}
          width={BAND_WIDTH}
          y={at.y(ceiling)}
          height={Math.max(1, at.y(r.vih.volts) - at.y(ceiling))}
          data-kind="vih"
          data-volts={r.vih.volts}
          data-pin={r.pin}
          data-vdd={r.vih.receiverVdd}
        >
          <title>{`${r.pin} reads high from ${volts(r.vih.volts)} (at ${volts(r.vih.receiverVdd)})`}</title>
        </rect>
      )}
      {r.vil !== null && (
        <rect
          className="ladder-zone-low"
          x={bx}
          width={BAND_WIDTH}
          y={at.y(r.vil.volts)}
          height={Math.max(1, at.y(0) - at.y(r.vil.volts))}
          data-kind="vil"
          data-volts={r.vil.volts}
          data-pin={r.pin}
          data-vdd={r.vil.receiverVdd}
        >
          <title>{`${r.pin} reads low up to ${volts(r.vil.volts)} (at ${volts(r.vil.receiverVdd)})`}</title>
        </rect>
      )}
      <line
        className="ladder-rail"
        x1={bx - 6}
        x2={bx - 6}
        y1={at.y(r.railRange.max)}
        y2={at.y(r.railRange.min)}
        data-kind="rail"
        data-rail={r.rail}
        data-min={r.railRange.min}
        data-max={r.railRange.max}
        data-pin={r.pin}
      >
        <title>{`${railName(r.rail)}: ${volts(r.railRange.min)} to ${volts(r.railRange.max)}`}</title>
      </line>
      {r.viMax !== null && (
        <line
          className="ladder-limit"
          x1={bx - 8}
          x2={bx + BAND_WIDTH + 8}
          y1={at.y(r.viMax.volts)}
          y2={at.y(r.viMax.volts)}
          data-kind="vimax"
          data-volts={r.viMax.volts}
          data-pin={r.pin}
        />
      )}
      <Labels x={bx + BAND_WIDTH + 6} items={labels} />
    </g>
  );
}

function MarginBracket({
  m,
  lane,
  at,
  patterns,
}: {
  m: LadderMargin;
  lane: Lane;
  at: LadderLayout;
  patterns: Patterns;
}) {
  const cx = lane.x + 22;
  const top = at.y(Math.max(m.upper, m.lower));
  const bottom = at.y(Math.min(m.upper, m.lower));
  const fill = m.status === 'pass' ? undefined : `url(#${m.status === 'fail' ? patterns.fail : patterns.warning})`;
  const name = m.kind === 'nmh' ? 'NMH' : 'NML';
  const mid = (top + bottom) / 2;
  return (
    <g
      className={`ladder-margin ladder-margin-${m.status}`}
      data-kind={m.kind}
      data-margin={m.margin}
      data-status={m.status}
      data-driver={m.driver}
      data-receiver={m.receiver}
      data-upper={m.upper}
      data-lower={m.lower}
    >
      <title>{`${name} ${m.driver} → ${m.receiver}: ${marginVolts(m.margin)} (${STATUS_TEXT[m.status]})`}</title>
      <line className="ladder-guide" x1={lane.x} x2={cx + 6} y1={at.y(m.upper)} y2={at.y(m.upper)} />
      <line className="ladder-guide" x1={cx - 6} x2={lane.x + LANE_WIDTH} y1={at.y(m.lower)} y2={at.y(m.lower)} />
      <rect
        className="ladder-margin-bar"
        x={cx - 5}
        width={10}
        y={top}
        height={Math.max(1, bottom - top)}
        {...(fill === undefined ? {} : { fill })}
      />
      <text x={cx + 10} y={mid}>{`${name} ${marginVolts(m.margin)}`}</text>
      <text className="ladder-status" x={cx + 10} y={mid + 13}>
        {STATUS_TEXT[m.status]}
      </text>
    </g>
  );
}

function MarginLane({ lane, at, patterns }: { lane: Lane; at: LadderLayout; patterns: Patterns }) {
  return (
    <g className="ladder-lane" data-driver={lane.driver} data-receiver={lane.receiver}>
      <text className="ladder-sub" x={lane.x + 4} y={18}>
        {lane.driver}
      </text>
      <text className="ladder-sub" x={lane.x + 4} y={34}>{`→ ${lane.receiver}`}</text>
      {lane.margins.map((m) => (
        <MarginBracket key={m.kind} m={m} lane={lane} at={at} patterns={patterns} />
      ))}
    </g>
  );
}

function PatternDefs({ ids }: { ids: Patterns }) {
  return (
    <defs>
      <pattern id={ids.undefined} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line className="ladder-hatch-undefined" x1={0} y1={0} x2={0} y2={6} />
      </pattern>
      <pattern id={ids.warning} width={5} height={5} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <line className="ladder-hatch-warning" x1={0} y1={0} x2={0} y2={5} />
      </pattern>
      <pattern id={ids.fail} width={5} height={5} patternUnits="userSpaceOnUse">
        <path className="ladder-hatch-fail" d="M0 0 L5 5 M5 0 L0 5" />
      </pattern>
    </defs>
  );
}

/** Draws a {@link Ladder}. Pure: the same model gives the same drawing. */
export const VoltageLadder = memo(function VoltageLadder({
  ladder,
  height = 420,
  className,
  fit = false,
  railName = (id: string) => id,
}: VoltageLadderProps) {
  const base = useId().replace(/[^A-Za-z0-9_-]/g, '');
  const patterns: Patterns = {
    undefined: `ladder-${base}-undef`,
    warning: `ladder-${base}-warn`,
    fail: `ladder-${base}-fail`,
  };
  const at = layoutLadder(ladder, height);
  const caption = `Voltage ladder of ${ladder.label} in ${ladder.state.label}`;
  const off = ladder.unpowered.map((p) => `${p.pin} (${railName(p.rail)} off)`).join(', ');
  return (
    <RailName.Provider value={railName}>
      <svg
        className={['voltage-ladder', className].filter(Boolean).join(' ')}
        role="img"
        aria-label={caption}
        width={fit ? '100%' : at.width}
        height={fit ? undefined : at.height}
        // Scaled, the viewBox keeps the proportions: the height follows the width.
        style={fit ? { maxWidth: at.width, height: 'auto', aspectRatio: `${at.width} / ${at.height}` } : undefined}
        viewBox={`0 0 ${at.width} ${at.height}`}
        data-width={at.width}
        data-net={ladder.net}
        data-state={ladder.state.id}
        data-min-margin={ladder.minMargin}
      >
        <title>{caption}</title>
        <PatternDefs ids={patterns} />
        <Axis ladder={ladder} at={at} />
        {ladder.drivers.map((d, k) => (
          <DriverColumn key={d.pin} d={d} x={at.driverX[k]!} at={at} />
        ))}
        {at.lanes.map((lane) => (
          <MarginLane key={`${lane.driver}>${lane.receiver}`} lane={lane} at={at} patterns={patterns} />
        ))}
        {ladder.receivers.map((r, k) => (
          <ReceiverColumn key={r.pin} r={r} x={at.receiverX[k]!} at={at} patterns={patterns} />
        ))}
        <text className="ladder-caption" x={8} y={at.height - 12} data-kind="state" data-state={ladder.state.id}>
          {`${ladder.state.label}${off === '' ? '' : ` · unpowered: ${off}`}${ladder.drivers.length === 0 ? ' · no powered driver' : ''}`}
        </text>
        {ladder.unpowered.map((p) => (
          <g key={p.pin} data-kind="unpowered" data-pin={p.pin} data-rail={p.rail} />
        ))}
      </svg>
    </RailName.Provider>
  );
});

/** Width the drawing needs for a ladder, px (for a scroll container). */
export function ladderWidth(ladder: Ladder): number {
  return layoutLadder(ladder, 420).width;
}
