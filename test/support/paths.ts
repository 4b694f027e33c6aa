/**
 * Small designs with parts between chips (version 2), shared by the rule tables, the engine's
 * path tests and the command line's cases. Every value is invented demo data or a reference
 * case whose source the test that uses it names.
 */
import type { Design, Profile } from '../../rules/model/schema.ts';
import {
  bidir,
  design,
  input,
  net,
  output,
  part,
  rail,
  rail1v8,
  rail3v3,
  rail5v0,
  resistor,
  fetShifter,
  diodeShifter,
} from './build.ts';

/**
 * A 5 V CMOS driver guaranteeing VDD − 0.1 V and 0.1 V up to 2 mA (the form of the JESD7 / 74HC
 * DC table's light-load row, from memory), with no input current, so that the divider's k is the
 * only thing between the driver and the receiver.
 */
export const cmos5: Profile = {
  id: 'cmos5',
  label: '5 V CMOS driver',
  source: 'JESD7 light-load row, from memory',
  params: { voh: [{ v: 'VDD-0.1', i: 2e-3 }], vol: [{ v: 0.1, i: 2e-3 }] },
};

/**
 * The divider: 5 V ±5 % CMOS through 2.2 kΩ / 3.3 kΩ at ±1 % into a 3.3 V LVCMOS input
 * (VIH 2.0 V, VIL 0.8 V, viMax VDD + 0.5: lvcmos33, JESD8C restated), 10 pF on the divided net.
 */
export function divider(extra: { r1?: number; r2?: number; tolerance?: number; maxRiseTime?: number } = {}): Design {
  const tol = extra.tolerance ?? 0.01;
  return design({
    rails: [rail5v0, rail3v3],
    profiles: [cmos5],
    parts: [part('U1', '5v0', 'cmos5', [output('Y')]), part('U2', '3v3', 'lvcmos33', [input('A')])],
    discretes: [
      resistor('R1', extra.r1 ?? 2200, { tolerance: tol }),
      resistor('R2', extra.r2 ?? 3300, { tolerance: tol, tie: { '2': 'ground' } }),
    ],
    nets: [
      net('TX5', ['U1.Y', 'R1.1']),
      // 5 pF of wiring and the input's 5 pF (lvcmos33): the 10 pF on the divided net.
      net('RX33', ['R1.2', 'R2.1', 'U2.A'], {
        wiringCapacitance: 5e-12,
        ...(extra.maxRiseTime === undefined ? {} : { maxRiseTime: extra.maxRiseTime }),
      }),
    ],
  });
}

/**
 * The series resistor: a 5 V 74HC output through 1 kΩ ±5 % into a clamped 3.3 V LVCMOS
 * input (viMax VDD + 0.5 V), whose injection limit and rail's minimum load a case may state.
 */
export function seriesClamp(
  extra: { ohms?: number; injectionMax?: number; minLoad?: number; inputs?: number } = {},
): Design {
  const n = extra.inputs ?? 1;
  const inputs = Array.from({ length: n }, (_, k) => `A${k + 1}`);
  return design({
    rails: [rail5v0, { ...rail3v3, ...(extra.minLoad === undefined ? {} : { minLoad: extra.minLoad }) }],
    parts: [
      part(
        'U1',
        '5v0',
        '74hc',
        inputs.map((_a, k) => output(`Y${k + 1}`)),
      ),
      part(
        'U2',
        '3v3',
        'lvcmos33',
        inputs.map((a) =>
          input(a, extra.injectionMax === undefined ? {} : { params: { injectionMax: extra.injectionMax } }),
        ),
      ),
    ],
    discretes: inputs.map((_, k) => resistor(`R${k + 1}`, extra.ohms ?? 1000)),
    nets: inputs.flatMap((a, k) => [
      net(`TX${k + 1}`, [`U1.Y${k + 1}`, `R${k + 1}.1`]),
      net(`RX${k + 1}`, [`R${k + 1}.2`, `U2.${a}`]),
    ]),
  });
}

/** Two-wire bus pins with a stated VOL at a rated sink current (invented, in the I2C-bus specification's form: VOL 0.4 V at 3 mA). */
function busPins(id: string, rated: number): Profile {
  return {
    id,
    label: `bus pin ${id}`,
    source: 'I2C-bus specification form (0.3/0.7 VDD, VOL 0.4 V at the rated IOL); rating invented',
    params: { vih: '0.7*VDD', vil: '0.3*VDD', vol: [{ v: 0.4, i: rated }], viMax: 'VDD+0.5' },
  };
}

/**
 * The 3.3 V controller and 1.8 V two-wire sensor joined by a bidirectional N-MOSFET
 * shifter (source on the 1.8 V side, gate on 1.8 V): a pull-up on each side as resistor parts.
 */
export function fetBus(
  extra: {
    vgsThMax?: number;
    rdsOnMax?: number;
    lowPull?: number;
    highPull?: number | null;
    tolerance?: number;
    sensorRated?: number;
    gate?: string;
    highRail?: string;
  } = {},
): Design {
  const tol = extra.tolerance ?? 0.01;
  const highRail = extra.highRail ?? '3v3';
  const discretes = [
    fetShifter('Q1', extra.gate ?? '1v8', extra.vgsThMax ?? 1.0, extra.rdsOnMax ?? 6),
    resistor('RL', extra.lowPull ?? 4700, { tolerance: tol, tie: { '2': '1v8' } }),
    ...(extra.highPull === null
      ? []
      : [resistor('RH', extra.highPull ?? 4700, { tolerance: tol, tie: { '2': highRail } })]),
  ];
  return design({
    rails: [rail5v0, rail3v3, rail1v8],
    profiles: [busPins('ctrl33', 20e-3), busPins('sensor18', extra.sensorRated ?? 3e-3)],
    parts: [
      part('U1', highRail, 'ctrl33', [bidir('SDA', { drive: 'open-drain' })]),
      part('U2', '1v8', 'sensor18', [bidir('SDA', { drive: 'open-drain' })]),
    ],
    discretes,
    nets: [
      net('SDA_H', ['U1.SDA', 'Q1.D', ...(extra.highPull === null ? [] : ['RH.1'])]),
      net('SDA_L', ['U2.SDA', 'Q1.S', 'RL.1']),
    ],
  });
}

/**
 * A Schottky diode shifter: a 3.3 V 74LVC output (cathode side) into a 5 V input pulled up to
 * 5 V on the anode side.
 */
export function diodeLink(
  extra: { vfMax?: number; leakageMax?: number; pull?: number; vih?: number; vil?: number } = {},
): Design {
  return design({
    rails: [rail5v0, rail3v3],
    parts: [
      part('U1', '3v3', '74lvc', [output('Y')]),
      part('U2', '5v0', '74hct', [
        input('A', {
          params: {
            ...(extra.vih === undefined ? {} : { vih: extra.vih }),
            ...(extra.vil === undefined ? {} : { vil: extra.vil }),
          },
        }),
      ]),
    ],
    discretes: [
      diodeShifter('D1', extra.vfMax ?? 0.45, extra.leakageMax ?? 5e-6),
      resistor('RP', extra.pull ?? 10e3, { tolerance: 0.01, tie: { '2': '5v0' } }),
    ],
    nets: [net('TX', ['U1.Y', 'D1.K']), net('RX', ['D1.A', 'RP.1', 'U2.A'])],
  });
}

export { rail };
