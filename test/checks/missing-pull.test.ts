import rule from '../../rules/checks/missing-pull.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { bidir, design, input, link, net, output, part, scenario } from '../support/build.ts';

// An open-drain output only sinks current (common practice); the catalogue's rule asks for a
// pull resistor to a rail on every net with a powered open-drain driver. i2c pins: I2C-bus
// specification levels, as the library restates them.
const od = { drive: 'open-drain' as const };

/** Two bus pins (bidir, open-drain) of parts M and S on one net, with what the case adds. */
function bus(
  extra: { pull?: { to: string; ohms: number }; pinPull?: { to: string; ohms: number }; off?: string[] } = {},
) {
  return design({
    parts: [
      part('M', '3v3', 'i2c', [
        bidir('SDA', { ...od, ...(extra.pinPull === undefined ? {} : { pull: extra.pinPull }) }),
      ]),
      part('S', '3v3', 'i2c', [bidir('SDA', od)]),
    ],
    nets: [net('SDA', ['M.SDA', 'S.SDA'], extra.pull === undefined ? {} : { pull: extra.pull })],
    ...(extra.off === undefined ? {} : { scenarios: [scenario('off', extra.off)] }),
  });
}

ruleTester(rule, {
  valid: [
    { name: 'open-drain bus with its own pull-up', design: bus({ pull: { to: '3v3', ohms: 4700 } }) },
    // A pin's internal pull-up is a pull resistor of the net (rules-catalogue.md, "Pull resistors of a net").
    { name: 'an internal pull-up of a pin counts', design: bus({ pinPull: { to: '3v3', ohms: 47000 } }) },
    // Several pulls: one to ground, one internal to a rail; the rail one is enough.
    {
      name: 'a ground pull beside an internal pull-up',
      design: bus({ pull: { to: 'ground', ohms: 100000 }, pinPull: { to: '3v3', ohms: 47000 } }),
    },
    // The catalogue: a pull to an off rail still counts here (level-high reports the dead pull-up).
    {
      name: 'a pull-up to a rail that is off in a scenario',
      design: bus({ pull: { to: '5v0', ohms: 4700 }, off: ['5v0'] }),
    },
    {
      name: 'push-pull drivers need no pull',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '3v3', profile: 'lvcmos33' }),
    },
    {
      name: 'a three-state driver is not open-drain',
      design: link(
        { rail: '3v3', profile: 'lvcmos33', pin: { drive: 'three-state' } },
        { rail: '3v3', profile: 'lvcmos33' },
      ),
    },
  ],
  invalid: [
    {
      name: 'open-drain bus with no pull at all',
      design: bus(),
      findings: [
        {
          messageId: 'noPull',
          severity: 'error',
          id: 'missing-pull:SDA:all-on',
          net: 'SDA',
          pins: ['M.SDA', 'S.SDA'],
          values: { drivers: ['M.SDA', 'S.SDA'] },
        },
      ],
    },
    {
      name: 'a pull to ground does not lift the net',
      design: link(
        { rail: '3v3', profile: 'lvcmos33', pin: od },
        { rail: '3v3', profile: 'lvcmos33' },
        {
          net: { pull: { to: 'ground', ohms: 10000 } },
        },
      ),
      findings: [
        { messageId: 'onlyGroundPulls', severity: 'error', id: 'missing-pull:N:all-on', values: { drivers: ['D.Y'] } },
      ],
    },
    {
      name: 'ground pulls inside pins do not count either',
      design: design({
        parts: [
          part('D', '3v3', 'lvcmos33', [output('Y', od)]),
          part('R', '3v3', 'lvcmos33', [input('A', { pull: { to: 'ground', ohms: 50000 } })]),
        ],
        nets: [net('N', ['D.Y', 'R.A'], { pull: { to: 'ground', ohms: 10000 } })],
      }),
      findings: [{ messageId: 'onlyGroundPulls', severity: 'error', values: { drivers: ['D.Y'] } }],
    },
    {
      // Only powered drivers count: with 1v8 off, its open-drain output drives nothing; with 3v3
      // off, M's does not either but S's (on 1v8) still does. One finding per net per state.
      name: 'a driver on an off rail is not counted',
      design: design({
        parts: [part('M', '3v3', 'i2c', [bidir('SDA', od)]), part('S', '1v8', 'i2c-lv', [bidir('SDA', od)])],
        nets: [net('SDA', ['M.SDA', 'S.SDA'])],
        scenarios: [scenario('both-off', ['3v3', '1v8']), scenario('io-off', ['3v3'])],
      }),
      findings: [
        { messageId: 'noPull', severity: 'error', scenario: 'all-on', values: { drivers: ['M.SDA', 'S.SDA'] } },
        {
          messageId: 'noPull',
          severity: 'error',
          scenario: 'io-off',
          id: 'missing-pull:SDA:io-off',
          values: { drivers: ['S.SDA'] },
        },
      ],
    },
    {
      // A push-pull output beside an open-drain one (contention's to judge) still leaves the
      // open-drain driver without a pull: the catalogue asks only for a powered open-drain driver.
      name: 'an open-drain driver beside a push-pull one',
      design: design({
        parts: [part('D', '3v3', 'lvcmos33', [output('Y', od)]), part('E', '3v3', 'lvcmos33', [output('Y')])],
        nets: [net('N', ['D.Y', 'E.Y'])],
      }),
      findings: [{ messageId: 'noPull', severity: 'error', pins: ['D.Y'], values: { drivers: ['D.Y'] } }],
    },
  ],
});
