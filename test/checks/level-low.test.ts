import rule from '../../rules/checks/level-low.ts';
import { ruleTester } from '../support/ruleTester.ts';
import { design, link, net, output, input, part, rail, rail1v8, rail3v3, rail5v0 } from '../support/build.ts';

const rail2v5 = rail('2v5', 2.5);
const withRails = { rails: [rail5v0, rail3v3, rail2v5, rail1v8] };

/** A 2.5 V LVCMOS output into `n` 74LS inputs (handbook: IIL 0.4 mA each). */
function lvcmos25IntoLs(n: number) {
  const loads = Array.from({ length: n }, (_, k) => part(`L${k + 1}`, '5v0', '74ls', [input('A')]));
  return design({
    ...withRails,
    parts: [part('D', '2v5', 'lvcmos25', [output('Y')]), ...loads],
    nets: [net('N', ['D.Y', ...loads.map((p) => `${p.id}.A`)])],
  });
}

ruleTester(rule, {
  valid: [
    {
      // JESD8C: VOL 0.2 V against VIL 0.8 V.
      name: '3.3 V LVCMOS into 3.3 V LVCMOS',
      design: link({ rail: '3v3', profile: 'lvcmos33' }, { rail: '3v3', profile: 'lvcmos33' }),
    },
    {
      // One 74LS load (0.4 mA) selects JESD8-5's 1 mA row, VOL 0.4 V, against the handbook's 0.8 V.
      name: 'a light load selects the low test current',
      design: lvcmos25IntoLs(1),
    },
    {
      name: 'margin exactly at minMargin is not a warning',
      design: link(
        { rail: '3v3', profile: 'off-board', part: { params: { vol: [{ v: 0.6, i: 1e-3 }] } } },
        { rail: '3v3', profile: 'lvcmos33' },
      ),
    },
  ],
  invalid: [
    {
      // Three 74LS loads draw 1.2 mA (handbook IIL 0.4 mA): past JESD8-5's 1 mA row, so its
      // 2 mA row applies, VOL 0.7 V, against the 74LS VIL of 0.8 V (handbook).
      name: 'a heavier load selects a worse guaranteed level',
      design: lvcmos25IntoLs(3),
      findings: [
        {
          messageId: 'lowMarginLow',
          severity: 'warning',
          id: 'level-low:N:all-on:D.Y>L1.A',
          values: { vol: 0.7, vil: 0.8, margin: 0.1 },
        },
        { messageId: 'lowMarginLow', severity: 'warning', id: 'level-low:N:all-on:D.Y>L2.A' },
        { messageId: 'lowMarginLow', severity: 'warning', id: 'level-low:N:all-on:D.Y>L3.A' },
      ],
    },
    {
      name: 'margin of exactly 0 V is a warning, not an error',
      design: link(
        { rail: '3v3', profile: 'off-board', part: { params: { vol: [{ v: 0.8, i: 1e-3 }] } } },
        { rail: '3v3', profile: 'lvcmos33' },
      ),
      findings: [{ messageId: 'lowMarginLow', severity: 'warning', values: { margin: 0 } }],
    },
    {
      // A 470 Ω pull-up to 3.3 V pushes (3.465 − 0.2·1.89) / 470 ≈ 6.568 mA into a 1.8 V two-wire
      // driver rated at 3 mA (I2C-bus specification, VOL 0.2·VDD for VDD ≤ 2 V): with one point,
      // the resistive line through the origin is the estimate, 0.378 V × 6.568 / 3 ≈ 0.828 V at
      // 1.89 V, against a receiver's 0.3 V.
      name: 'a pull-up stronger than the driver is rated for',
      design: link(
        { rail: '1v8', profile: 'i2c-lv', pin: { drive: 'open-drain' } },
        { rail: '1v8', profile: 'off-board', pin: { params: { vil: 0.3 } } },
        { net: { pull: { to: '3v3', ohms: 470 } } },
      ),
      findings: [
        {
          messageId: 'lowFails',
          severity: 'error',
          values: {
            vol: (0.2 * 1.89 * ((3.465 - 0.2 * 1.89) / 470)) / 3e-3,
            vil: 0.3,
            margin: 0.3 - (0.2 * 1.89 * ((3.465 - 0.2 * 1.89) / 470)) / 3e-3,
            estimate: true,
            driverVdd: 1.89,
            receiverVdd: 1.89,
          },
        },
      ],
    },
    {
      // A 1.8 V two-wire bus at 1.71 V: VOL 0.2·VDD = 0.342 V @ 3 mA, VIL 0.3·VDD = 0.513 V
      // (I2C-bus specification, VDD ≤ 2 V). 4.59 mA of low-level current: 0.342 × 4.59 / 3 =
      // 0.52326 V, 10.3 mV above VIL: an error (judged at the row's own 0.342 V it was a warning).
      name: 'a single row overloaded: the resistive line turns a warning into an error',
      design: link(
        { rail: 'x', profile: 'off-board', pin: { params: { vol: [{ v: '0.2*VDD', i: 3e-3 }] } } },
        { rail: 'x', profile: 'i2c-lv', pin: { params: { iil: 4.59e-3 } } },
        { rails: [rail('x', 1.71, { tolerance: 0 })] },
      ),
      findings: [
        {
          messageId: 'lowFails',
          severity: 'error',
          values: { vol: (0.342 * 4.59) / 3, vil: 0.513, margin: 0.513 - (0.342 * 4.59) / 3, estimate: true },
        },
      ],
    },
    {
      // A Schmitt input is judged by vtMinus: 0.15 V against the driver's 0.2 V.
      name: 'a Schmitt input is judged by vtMinus, not vil',
      design: link(
        { rail: '3v3', profile: 'lvcmos33' },
        { rail: '3v3', profile: 'lvcmos33', pin: { params: { schmitt: { vtPlus: 2.0, vtMinus: 0.15 } } } },
      ),
      findings: [{ messageId: 'lowFails', severity: 'error', values: { vil: 0.15, vol: 0.2 } }],
    },
  ],
});
