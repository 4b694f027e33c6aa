import rule from '../../rules/checks/floating-input.ts';
import { ruleTester } from '../support/ruleTester.ts';
import {
  bidir,
  design,
  input,
  link,
  net,
  output,
  part,
  rail,
  rail3v3,
  rail5v0,
  resistor,
  scenario,
} from '../support/build.ts';
import { seriesClamp } from '../support/paths.ts';

// Common practice: an unused or undriven CMOS input must be tied or pulled to a defined level.

const hc = { rail: '5v0', profile: '74hc' };
const rails = [rail5v0, rail3v3, rail('aux', 5, { tolerance: 0.05 })];

/** Receivers `R.A` (and `S.A`) on net `N`, with whatever drivers a case adds. */
function receiversOnly(
  extra: Parameters<typeof net>[2] = {},
  more: { scenarios?: ReturnType<typeof scenario>[] } = {},
) {
  return design({
    rails,
    parts: [part('R', '5v0', '74hc', [input('A')]), part('S', '5v0', '74hc', [input('A')])],
    nets: [net('N', ['R.A', 'S.A'], extra)],
    ...more,
  });
}

ruleTester(rule, {
  valid: [
    { name: 'a driven input', design: link(hc, hc) },
    { name: 'an input driven through a series resistor from another net', design: seriesClamp() },
    {
      name: 'a resistor part tied to ground holds the net',
      design: design({
        parts: [part('R', '5v0', '74hc', [input('A')])],
        discretes: [resistor('R1', 10e3, { tie: { '2': 'ground' } })],
        nets: [net('N', ['R.A', 'R1.1'])],
      }),
    },
    {
      // A bus-hold input keeps the net at its last level (datasheet convention, from memory).
      name: 'a bus-hold input is not floating',
      design: design({
        parts: [
          part('R', '5v0', '74hc', [input('A', { params: { busHold: { hold: 75e-6, overdrive: 500e-6 } } })]),
          part('S', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['R.A', 'S.A'])],
      }),
    },
    {
      name: "receivers held by the net's pull resistor",
      design: receiversOnly({ pull: { to: 'ground', ohms: 10e3 } }),
    },
    {
      name: 'a pull inside a pin counts as a pull',
      design: design({
        parts: [
          part('R', '5v0', '74hc', [input('A', { pull: { to: '5v0', ohms: 50e3 } })]),
          part('S', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['R.A', 'S.A'])],
      }),
    },
    {
      // rules-catalogue.md: a pull to an off rail still counts here (level-high reports the level).
      name: 'a pull to an off rail still counts',
      design: receiversOnly({ pull: { to: '3v3', ohms: 10e3 } }, { scenarios: [scenario('io-off', ['3v3'])] }),
    },
    {
      name: 'three-state drivers with a pull resistor',
      design: design({
        parts: [
          part('A', '5v0', '74hc', [output('Y', { drive: 'three-state' })]),
          part('R', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['A.Y', 'R.A'], { pull: { to: '5v0', ohms: 10e3 } })],
      }),
    },
    {
      // missing-pull's to report, not this rule's.
      name: 'an open-drain driver without a pull is not a floating input',
      design: link({ ...hc, pin: { drive: 'open-drain' } }, hc),
    },
    {
      name: 'a three-state driver beside a push-pull one holds the net',
      design: design({
        parts: [
          part('A', '5v0', '74hc', [output('Y', { drive: 'three-state' })]),
          part('B', '5v0', '74hc', [output('Y')]),
          part('R', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['A.Y', 'B.Y', 'R.A'])],
      }),
    },
    {
      name: 'a net of drivers only has nothing to float',
      design: design({ parts: [part('A', '5v0', '74hc', [output('Y')])], nets: [net('N', ['A.Y'])] }),
    },
    {
      name: 'unconnected outputs, bidir pins and pulled inputs are not floating inputs',
      design: design({
        parts: [
          part('U', '5v0', '74hc', [output('Y'), bidir('IO'), input('A', { pull: { to: 'ground', ohms: 100e3 } })]),
        ],
      }),
    },
  ],
  invalid: [
    {
      name: 'receivers with no driver and no pull',
      design: receiversOnly(),
      findings: [
        {
          messageId: 'noDriver',
          severity: 'error',
          id: 'floating-input:N:all-on',
          net: 'N',
          pins: ['R.A', 'S.A'],
          values: { pins: ['R.A', 'S.A'] },
        },
      ],
    },
    {
      name: 'drivers that are all three-state and no pull',
      design: design({
        parts: [
          part('A', '5v0', '74hc', [output('Y', { drive: 'three-state' })]),
          part('B', '5v0', '74hc', [output('Y', { drive: 'three-state' })]),
          part('R', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['A.Y', 'B.Y', 'R.A'])],
      }),
      findings: [
        {
          messageId: 'allThreeState',
          severity: 'warning',
          pins: ['R.A'],
          values: { pins: ['R.A'], drivers: ['A.Y', 'B.Y'] },
        },
      ],
    },
    {
      // design-format.md: a bidir pin drives three-state by default, and receives too.
      name: 'bidir pins alone float while none is enabled',
      design: design({
        parts: [part('A', '5v0', '74hc', [bidir('IO')]), part('B', '5v0', '74hc', [bidir('IO')])],
        nets: [net('N', ['A.IO', 'B.IO'])],
      }),
      findings: [
        {
          messageId: 'allThreeState',
          severity: 'warning',
          values: { pins: ['A.IO', 'B.IO'], drivers: ['A.IO', 'B.IO'] },
        },
      ],
    },
    {
      // With the driver's rail off the receiver is undriven; with the receiver's rail off nothing is judged.
      name: 'a driver on an off rail does not count; a receiver on one is not judged',
      design: link(
        { rail: 'aux', profile: '74hc' },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          rails,
          scenarios: [scenario('drv-off', ['aux']), scenario('rx-off', ['3v3'])],
        },
      ),
      findings: [
        {
          messageId: 'noDriver',
          severity: 'error',
          scenario: 'drv-off',
          id: 'floating-input:N:drv-off',
          pins: ['R.A'],
        },
      ],
    },
    {
      name: 'an input on no net, on a powered rail, without a pull',
      design: design({
        rails,
        parts: [
          part('U', 'aux', '74hc', [output('Y'), input('A'), input('B', { pull: { to: 'ground', ohms: 100e3 } })]),
        ],
        scenarios: [scenario('aux-off', ['aux'])],
      }),
      findings: [
        {
          messageId: 'unusedInput',
          severity: 'warning',
          scenario: 'all-on',
          id: 'floating-input:U.A:all-on',
          net: null,
          pins: ['U.A'],
          values: { pins: ['U.A'] },
        },
      ],
    },
    {
      name: 'a waived floating net stays, marked with its note',
      design: receiversOnly({ waivers: [{ rule: 'floating-input', note: 'driven through the test connector' }] }),
      findings: [{ messageId: 'noDriver', severity: 'error', waived: 'driven through the test connector' }],
    },
  ],
});
