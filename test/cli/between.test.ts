/**
 * `railcross check` on the issue's cases of parts between chips: each small design file in
 * test/cli/cases/ (version 2), checked in-process, gives the verdict the issue states. The
 * numbers are worked in the rule tables beside their sources; here the command's verdict,
 * rule and message are what is checked.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { main } from '../../rules/cli/main.ts';
import { ReportSchema, type Report } from '../../rules/report/reportSchema.ts';
import { fakeIo } from './fakeIo.ts';

const DIR = new URL('./cases/', import.meta.url);
const FILES = Object.fromEntries(
  readdirSync(DIR)
    .filter((f) => f.endsWith('.railcross.json'))
    .map((f) => [f, readFileSync(new URL(f, DIR), 'utf8')]),
);

async function checkJson(file: string): Promise<{ code: number; report: Report }> {
  const io = fakeIo(FILES, { SOURCE_DATE_EPOCH: '1767225600' });
  const code = await main(['check', file, '--json'], io);
  expect(io.err).toBe('');
  return { code, report: ReportSchema.parse(JSON.parse(io.out)) as Report };
}

interface Case {
  name: string;
  file: string;
  exit: 0 | 1;
  /** Unwaived findings that must be there: rule, severity, and a piece of the message. */
  has: [string, 'error' | 'warning' | 'info', RegExp][];
  /** Rules that must have no error. */
  noErrorFrom?: string[];
}

const CASES: Case[] = [
  {
    // 1.49 V/9.9 kΩ + 3.065 V/990 Ω = 0.151 mA + 3.096 mA = 3.25 mA > 3 mA (I2C-bus specification's sink formula per side).
    name: '3.3 V controller + 1.8 V sensor, FET shifter, 10 kΩ / 1 kΩ: the sensor must sink both pull-ups',
    file: 'fet-shifter-sink.railcross.json',
    exit: 1,
    has: [
      [
        'fet-shifter',
        'error',
        /U2\.SDA must sink both pull-ups through Q1: 151 µA \+ 3\.1 mA = 3\.25 mA, more than its rated 3 mA/,
      ],
    ],
  },
  {
    name: 'the same bus with 4.7 kΩ on each side passes',
    file: 'fet-shifter-ok.railcross.json',
    exit: 0,
    has: [],
    noErrorFrom: ['fet-shifter', 'drive-load', 'level-low', 'level-high'],
  },
  {
    // 1.71 V − 0.4 V = 1.31 V < 1.5 V.
    name: 'a 1.5 V threshold FET on the 1.8 V gate is not guaranteed to turn on',
    file: 'fet-shifter-threshold.railcross.json',
    exit: 1,
    has: [['fet-shifter', 'error', /VGS = 1\.71 V − 0\.4 V = 1\.31 V, below its VGS\(th\) of up to 1\.5 V/]],
  },
  {
    // 5.25 × 0.6048 = 3.175 V < 3.135 + 0.5 V: no over-voltage, once the divider can be drawn.
    name: '5 V into 3.3 V through a 2.2 kΩ / 3.3 kΩ divider is no over-voltage',
    file: 'divider.railcross.json',
    exit: 0,
    has: [['rail-crossing', 'info', /RX33 joins rails 3\.3 V, 5 V: worst NMH 0\.761 V, worst NML 0\.733 V/]],
    noErrorFrom: ['overvoltage', 'level-high', 'level-low'],
  },
  {
    // (5.25 − 3.135)/950 = 2.23 mA ≤ 5 mA; the rail's 10 mA minimum load absorbs it.
    name: 'a 1 kΩ series resistor within a 5 mA injection limit',
    file: 'series-within.railcross.json',
    exit: 0,
    has: [
      ['clamp-current', 'info', /clamp carries at most 2\.23 mA, within its 5 mA limit/],
      ['rail-injection', 'info', /2\.23 mA of clamp current flows into 3\.3 V/],
    ],
    noErrorFrom: ['overvoltage'],
  },
  {
    name: 'the same resistor against a 2 mA limit is too small',
    file: 'series-over.railcross.json',
    exit: 1,
    has: [['clamp-current', 'error', /its clamp carries up to 2\.23 mA, more than the 2 mA it may take/]],
  },
  {
    name: 'without an injection limit the over-voltage error stands',
    file: 'series-no-limit.railcross.json',
    exit: 1,
    has: [
      [
        'overvoltage',
        'error',
        /through series resistance.*up to 2\.23 mA, and the pin states no injection-current limit/,
      ],
    ],
  },
  {
    // 3.465 × 4.5/9.2 = 1.69 V > VIL 0.8 V.
    name: 'a weak push-pull translator under a 4.7 kΩ pull-up loses its low',
    file: 'translator-pullup.railcross.json',
    exit: 1,
    has: [['translator-pull', 'error', /= 1\.695 V, above U6\.A's VIL of 0\.8 V/]],
  },
  {
    // (3.135 − 2.0)/500 µA = 2.27 kΩ < 4.7 kΩ.
    name: 'a 4.7 kΩ strap cannot overdrive a 500 µA bus-hold input',
    file: 'bus-hold-strap.railcross.json',
    exit: 1,
    has: [['bus-hold', 'error', /must be at most 2\.27 kΩ/]],
  },
  {
    name: 'a −12 V line through 10 kΩ into a 3.3 V input is caught below ground',
    file: 'line-12v.railcross.json',
    exit: 1,
    has: [['undervoltage', 'error', /J1\.TXD can pull U2\.RXD to -12\.6 V, below its limit of -0\.5 V/]],
  },
];

describe('railcross check on parts between chips', () => {
  it('has a case for every file, and a file for every case', () => {
    expect(Object.keys(FILES).sort()).toEqual(CASES.map((c) => c.file).sort());
  });

  it.each(CASES)('$name', async ({ file, exit, has, noErrorFrom }) => {
    const { code, report } = await checkJson(file);
    const live = report.findings.filter((f) => f.waived === undefined);
    for (const [rule, severity, message] of has) {
      const hit = live.find((f) => f.rule === rule && f.severity === severity && message.test(f.message));
      expect(
        hit,
        `${rule} ${severity} ${message} among:\n${live.map((f) => `${f.rule} ${f.severity}: ${f.message}`).join('\n')}`,
      ).toBeDefined();
    }
    for (const rule of noErrorFrom ?? [])
      expect(live.filter((f) => f.rule === rule && f.severity === 'error')).toEqual([]);
    // A net reached through a part between chips is a crossing row when the path joins rails.
    if (file === 'divider.railcross.json')
      expect(report.crossings.map((c) => [c.net, c.rails])).toEqual([['RX33', ['3v3', '5v0']]]);
    expect(code).toBe(exit);
  });
});
