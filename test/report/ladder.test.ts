/**
 * The voltage ladder model against the engine's analysis (every pair number the same number),
 * and against hand values for the example's nets.
 *
 * Hand values: the controller's VOH is the example's own invented data (VDD − 0.2 V at
 * 100 µA, VOL 0.15 V at 1 mA); 74HC thresholds 0.675·VDD + 0.15 and 0.325·VDD − 0.15 (JESD7's
 * table as conservative lines, as the library restates it); a CMOS input's limit VDD + 0.5 V
 * (common practice); rails 5 % (demo data); the two-wire bus pins' VIH 0.7·VDD and 10 µA input
 * current (I2C-bus specification).
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../app/example.ts';
import { check } from '../../rules/check/check.ts';
import type { NetView, PowerState } from '../../rules/engine/types.ts';
import { ladderAxis, ladderFor, type Ladder } from '../../rules/report/ladder.ts';

const result = check(exampleDesign());
const views: { state: string; net: string; view: NetView; power: PowerState }[] = [];
for (const [state, nets] of result.nets)
  for (const [net, r] of nets)
    views.push({ state, net, view: r.view, power: result.states.find((s) => s.id === state)! });

const close = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(a), Math.abs(b));

function ladderOf(state: string, net: string): Ladder {
  return ladderFor(result.nets.get(state)!.get(net)!.view, result.states.find((s) => s.id === state)!);
}

describe('ladderFor: the same numbers as the analysis, on every net of the example in every power state', () => {
  it('covers the example (21 nets, 3 power states)', () => {
    expect(views.length).toBe(63);
  });

  it.each(views)('$state $net', ({ view, power }) => {
    const l = ladderFor(view, power);
    // Each pair side is one margin, with the analysis' own numbers.
    const expected = view.analysis.pairs.flatMap((p) => [
      ...(p.high === null
        ? []
        : [
            {
              kind: 'nmh',
              driver: p.driver,
              receiver: p.receiver,
              upper: p.high.out,
              lower: p.high.threshold,
              margin: p.high.margin,
              status: p.high.status,
            },
          ]),
      ...(p.low === null
        ? []
        : [
            {
              kind: 'nml',
              driver: p.driver,
              receiver: p.receiver,
              upper: p.low.threshold,
              lower: p.low.out,
              margin: p.low.margin,
              status: p.low.status,
            },
          ]),
    ]);
    expect(
      l.margins.map(({ kind, driver, receiver, upper, lower, margin, status }) => ({
        kind,
        driver,
        receiver,
        upper,
        lower,
        margin,
        status,
      })),
    ).toEqual(expected);
    // Drivers and receivers at their worst pair.
    for (const d of l.drivers) {
      const highs = view.analysis.pairs.filter((p) => p.driver === d.pin && p.high !== null).map((p) => p.high!);
      if (highs.length > 0) expect(d.high?.from).toBe(highs.reduce((w, s) => (s.margin < w.margin ? s : w)).out);
      const lows = view.analysis.pairs.filter((p) => p.driver === d.pin && p.low !== null).map((p) => p.low!);
      if (lows.length > 0) expect(d.low?.to).toBe(lows.reduce((w, s) => (s.margin < w.margin ? s : w)).out);
    }
    for (const r of l.receivers) {
      const highs = view.analysis.pairs.filter((p) => p.receiver === r.pin && p.high !== null).map((p) => p.high!);
      if (highs.length > 0) expect(r.vih?.volts).toBe(highs.reduce((w, s) => (s.margin < w.margin ? s : w)).threshold);
    }
    expect([l.worstHigh, l.worstLow]).toEqual([view.analysis.worstHigh, view.analysis.worstLow]);
    expect(l.drivers.map((d) => d.pin)).toEqual(view.drivers.map((d) => d.key));
    expect(l.receivers.map((r) => r.pin)).toEqual(view.receivers.map((r) => r.key));
    expect(l.unpowered.map((p) => p.pin)).toEqual(view.unpowered.map((p) => p.key));
    // The axis holds everything drawn.
    const drawn = [
      ...l.rails.map((r) => r.max),
      ...l.drivers.flatMap((d) => [d.high?.to ?? 0, d.low?.to ?? 0]),
      ...l.receivers.flatMap((r) => [r.viMax?.volts ?? 0, r.vih?.volts ?? 0]),
    ];
    expect(Math.max(...drawn)).toBeLessThan(l.top);
    expect(l.ticks[0]).toBe(0);
    expect(l.ticks[l.ticks.length - 1]).toBe(l.top);
  });
});

describe('ladderFor: hand values', () => {
  it('VALVE_EN, all rails on: 3.3 V controller output into a 5 V 74HC input', () => {
    const l = ladderOf('all-on', 'VALVE_EN');
    const d = l.drivers[0]!;
    expect(d.pin).toBe('U1.VALVE_EN');
    expect(close(d.high!.from, 3.135 - 0.2)).toBe(true); // VOH at the 3.3 V rail's lowest, 3.135 V
    expect(d.high!.to).toBe(3.135); // the band reaches the driver's supply at that corner
    expect(d.low!.to).toBe(0.15);
    const r = l.receivers[0]!;
    expect(close(r.vih!.volts, 0.675 * 5.25 + 0.15)).toBe(true); // VIH at the 5 V rail's highest
    expect(close(r.vil!.volts, 0.325 * 4.75 - 0.15)).toBe(true); // VIL at its lowest
    expect(close(r.viMax!.volts, 4.75 + 0.5)).toBe(true);
    expect(r.railRange).toEqual({ min: 4.75, max: 5.25 });
    const nmh = l.margins.find((m) => m.kind === 'nmh')!;
    expect(close(nmh.margin, 3.135 - 0.2 - (0.675 * 5.25 + 0.15))).toBe(true);
    expect(nmh.status).toBe('fail');
    expect(l.margins.find((m) => m.kind === 'nml')!.status).toBe('pass');
    // 5.25 V plus a little headroom, on half-volt marks.
    expect(l.top).toBe(6);
  });

  it('SDA, all rails on: the high band of an open-drain driver is the pulled-up level', () => {
    const l = ladderOf('all-on', 'SDA');
    const u1 = l.drivers.find((d) => d.pin === 'U1.SDA')!;
    // Worst pair U1.SDA → U2.SDA: 4.7 kΩ to 3.3 V at 3.135 V less 4.7 kΩ × Σ iih (1 µA + 10 µA).
    expect(u1.high!.driverVdd).toBeNull();
    expect(close(u1.high!.from, 3.135 - 4700 * 11e-6)).toBe(true);
    expect(u1.high!.vpull).toBe(3.135);
    expect(u1.drive).toBe('open-drain');
  });

  it('SDA, standby: the sensor is unpowered, the controller is in no pair and its high comes from the pull-up', () => {
    const l = ladderOf('standby', 'SDA');
    expect(l.state).toEqual({ id: 'standby', label: 'Standby: sensor rail off', off: ['1v8'] });
    expect(l.unpowered).toEqual([{ pin: 'U2.SDA', rail: '1v8', role: 'bidir' }]);
    expect(l.margins).toEqual([]);
    const u1 = l.drivers[0]!;
    expect(u1.high!.pair).toBeUndefined();
    // The sensor's pins still load the net with their iih when unpowered.
    expect(close(u1.high!.from, 3.135 - 4700 * 11e-6)).toBe(true);
    // A receiver in no pair: VIH at its rail's highest (0.7 × 3.465 V), VIL at its lowest.
    const r = l.receivers[0]!;
    expect(close(r.vih!.volts, 0.7 * 3.465)).toBe(true);
    expect(close(r.vil!.volts, 0.3 * 3.135)).toBe(true);
    expect(l.rails.find((x) => x.id === '1v8')).toEqual({ id: '1v8', min: 0, max: 0, off: true });
  });

  it('BOARD_SLEEP: receivers only, no driver', () => {
    const l = ladderOf('all-on', 'SLEEP');
    expect(l.drivers).toEqual([]);
    expect(l.receivers.map((r) => r.pin)).toEqual(['U3.SLEEP', 'U4.SLEEP']);
  });
});

describe('ladderAxis', () => {
  it.each([
    [5.25, 6, 0.5],
    [3.465, 4, 0.5],
    [1.89, 2, 0.25],
    [1.26, 1.4, 0.1],
    [15.75, 18, 2],
    [0, 0.2, 0.1],
    // Beyond the fixed steps (a level extrapolated from absurd test currents): 1-2-5 steps of the decade.
    [250, 280, 20],
    [1e9, 1.1e6, 1e5],
    [Infinity, 1.1e6, 1e5],
    [NaN, 0.2, 0.1],
  ])('highest %f V → top %f V in steps of %f V', (highest, top, step) => {
    const axis = ladderAxis(highest);
    expect(axis.top).toBe(top);
    expect(axis.ticks[1]).toBe(step);
    expect(axis.ticks.length).toBeLessThanOrEqual(15);
  });
});
