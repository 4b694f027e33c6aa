/**
 * Fixes that change the receiver: TTL-level inputs of the same family, a family whose inputs
 * tolerate the net's voltage, and recorded tolerances the user confirms from a datasheet.
 *
 * Facts behind the cases (as the profile library restates them, sources there): 3.3 V LVCMOS
 * VOH ≥ VDD − 0.2 V at 100 µA (JESD8C); 74HC VIH 0.675·VDD + 0.15 (JESD7 as a conservative
 * line), 74HCT/74ACT/74AHCT VIH 2.0 V (JESD7; 74ACT/74AHCT from memory); 74AC/74AHC VIH 0.7·VDD
 * (from memory); a CMOS input's limit VDD + 0.5 V (common practice); 74LVC and 74AHC(T) inputs
 * tolerate 5.5 V whatever VDD, 74LVC also unpowered (restated in parts' DC tables).
 */
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { link, rail, rail3v3, rail5v0, scenario } from '../../support/build.ts';
import { applyAndUndo, type FixCase, offered, partById, pinOf } from './support.ts';
import { harness } from '../harness.ts';
import { applyFix, fixesFor } from '../../../app/store/commands/fixes/index.ts';
import { setPartProfile } from '../../../app/store/commands/index.ts';

const greenhouse = exampleDesign();

/** A 5.3 V ± 3 % rail: up to 5.459 V, above a 5 V ± 5 % CMOS input's 4.75 + 0.5 = 5.25 V, below 5.5 V. */
const rail5v3 = rail('5v3', 5.3, { tolerance: 0.03 });

const cases: FixCase[] = [
  {
    name: 'greenhouse VALVE_EN: U3 from 74hc to 74hct (2.0 V ≤ 3.135 − 0.2 V)',
    start: greenhouse,
    finding: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
    fix: 'ttl-inputs',
    expect: (d) => expect(partById(d, 'U3').profile).toBe('74hct'),
  },
  {
    name: '74ac part to 74act',
    start: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: '74ac' }),
    finding: 'level-high:N:all-on:D.Y>R.A',
    fix: 'ttl-inputs',
    expect: (d) => expect(partById(d, 'R').profile).toBe('74act'),
  },
  {
    name: 'a pin that names its own profile (74ahc) switches alone, its part keeps 74hc',
    start: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: '74hc', pin: { profile: '74ahc' } }),
    finding: 'level-high:N:all-on:D.Y>R.A',
    fix: 'ttl-inputs',
    expect(d) {
      expect(pinOf(d, 'R.A').profile).toBe('74ahct');
      expect(partById(d, 'R').profile).toBe('74hc');
    },
  },
  {
    name: 'overvoltage on a 3.3 V LVCMOS input from a 5 V output: 74lvc',
    start: link({ rail: '5v0', profile: '74hc' }, { rail: '3v3', profile: 'lvcmos33' }),
    finding: 'overvoltage:N:all-on:R.A',
    fix: 'tolerant-family:74lvc',
    expect: (d) => expect(partById(d, 'R').profile).toBe('74lvc'),
  },
  {
    name: 'overvoltage on a 74HCT input from a 5.3 V rail: 74ahct (same fixed thresholds)',
    start: link({ rail: '5v3', profile: '74hc' }, { rail: '5v0', profile: '74hct' }, { rails: [rail5v0, rail5v3] }),
    finding: 'overvoltage:N:all-on:R.A',
    fix: 'tolerant-family:74ahct',
    expect: (d) => expect(partById(d, 'R').profile).toBe('74ahct'),
  },
  {
    name: 'greenhouse DISP_RX: the MCU pin recorded as 5.5 V-tolerant',
    start: greenhouse,
    finding: 'overvoltage:DISP_RX:all-on:U1.DISP_RX',
    fix: 'mark-tolerant',
    expect: (d) => expect(pinOf(d, 'U1.DISP_RX').params).toEqual({ viMax: 5.5 }),
  },
  {
    name: 'back-power into an unpowered 74AHCT input (limit 5.5 V): marked for partial power-down',
    start: link(
      { rail: '3v3', profile: 'lvcmos33' },
      { rail: '5v0', profile: '74ahct' },
      {
        rails: [rail5v0, rail3v3],
        scenarios: [scenario('standby', ['5v0'])],
      },
    ),
    finding: 'back-power:N:standby:R.A',
    fix: 'mark-unpowered-safe',
    expect: (d) => expect(pinOf(d, 'R.A').params).toEqual({ unpoweredSafe: true }),
  },
];

describe('change the receiver', () => {
  it.each(cases)('$name', ({ start, finding, fix, expect: check }) => {
    applyAndUndo(start, finding, fix, ({ design: d }) => check(d));
  });
});

describe('which receiver fixes are offered', () => {
  it.each([
    {
      name: 'no TTL variant when the driver cannot reach 2.0 V either (1.8 V LVCMOS: 1.71 − 0.2 V)',
      start: link({ rail: '1v8', profile: 'lvcmos18' }, { rail: '5v0', profile: '74hc' }),
      finding: 'level-high:N:all-on:D.Y>R.A',
      fixes: ['translator'],
    },
    {
      name: 'no TTL variant when the part overrides its VIH',
      start: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '5v0', profile: '74hc', part: { params: { vih: 3.5 } } },
      ),
      finding: 'level-high:N:all-on:D.Y>R.A',
      fixes: ['translator'],
    },
    {
      name: 'no TTL variant for a family without one (cmos4000)',
      start: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: 'cmos4000' }),
      finding: 'level-high:N:all-on:D.Y>R.A',
      fixes: ['translator'],
    },
    {
      name: 'library families are switched, never marked tolerant (74HC on 3.3 V fed 5 V)',
      start: link({ rail: '5v0', profile: '74hct' }, { rail: '3v3', profile: '74hc' }),
      finding: 'overvoltage:N:all-on:R.A',
      // The series resistor is offered too, saying it needs the input's injection limit, and a divider.
      fixes: ['tolerant-family:74lvc', 'translator', 'series-resistor', 'divider'],
    },
    {
      name: 'no tolerant family above 5.5 V (a 12 V source), and no common tolerance covers it',
      start: link(
        { rail: '12v', profile: 'cmos4000' },
        { rail: '3v3', profile: 'mcu-gpio' },
        { rails: [rail3v3, rail('12v', 12)] },
      ),
      finding: 'overvoltage:N:all-on:R.A',
      fixes: ['translator', 'series-resistor', 'divider'],
    },
    {
      name: 'greenhouse back-power on the 1.8 V sensor: its powered limit (1.71 + 0.5 V) is below 3.465 V, so no marking',
      // The open-drain bus may also be split at a FET shifter (version 2).
      start: greenhouse,
      finding: 'back-power:SDA:standby:U2.SDA',
      fixes: ['translator', 'fet-shifter'],
    },
    {
      name: 'back-power on a pin with a viMaxOff: marking it unpowered-safe would change nothing',
      start: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '5v0', profile: '74ahct', pin: { params: { viMaxOff: 0.3 } } },
        {
          rails: [rail5v0, rail3v3],
          scenarios: [scenario('standby', ['5v0'])],
        },
      ),
      finding: 'back-power:N:standby:R.A',
      fixes: ['translator'],
    },
  ])('$name', ({ start, finding, fixes }) => {
    expect(offered(start, finding)).toEqual(fixes);
  });

  it('a fix made for a profile that changed since refuses, changing nothing', () => {
    const h = harness(link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '5v0', profile: '74hc' }));
    const { result } = h.store.getState();
    const f = result.findings.find((x) => x.id === 'level-high:N:all-on:D.Y>R.A')!;
    const fix = fixesFor(f, h.design, result).find((x) => x.id === 'ttl-inputs')!;
    h.apply(setPartProfile('R', '74ac'));
    const before = h.design;
    expect(h.apply(applyFix(fix))).toEqual({ ok: false, reason: 'R no longer uses 74hc.' });
    expect(h.design).toBe(before);
  });
});
