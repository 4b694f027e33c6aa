/**
 * Small builders for test designs. They only fill in what the format requires, so that each
 * table case shows the few values it is about.
 */
import type { Design, Discrete, Net, Part, Pin, Rail, Scenario, Profile, Settings } from '../../rules/model/schema.ts';

/** Rails used across the tests: ±5 % unless a case says otherwise. */
export const rail5v0: Rail = { id: '5v0', label: '5 V', nominal: 5, tolerance: 0.05 };
export const rail3v3: Rail = { id: '3v3', label: '3.3 V', nominal: 3.3, tolerance: 0.05 };
export const rail2v5: Rail = { id: '2v5', label: '2.5 V', nominal: 2.5, tolerance: 0.05 };
export const rail1v8: Rail = { id: '1v8', label: '1.8 V', nominal: 1.8, tolerance: 0.05 };

export function rail(id: string, nominal: number, extra: Partial<Rail> = {}): Rail {
  return { id, label: `${nominal} V`, nominal, ...extra };
}

export interface DesignSpec {
  rails?: Rail[];
  parts: Part[];
  discretes?: Discrete[];
  nets?: Net[];
  scenarios?: Scenario[];
  profiles?: Profile[];
  settings?: Settings;
  title?: string;
}

export function design(spec: DesignSpec): Design {
  return {
    format: 'railcross.design',
    version: 2,
    title: spec.title ?? 'test',
    ...(spec.settings === undefined ? {} : { settings: spec.settings }),
    rails: spec.rails ?? [rail5v0, rail3v3, rail1v8],
    ...(spec.scenarios === undefined ? {} : { scenarios: spec.scenarios }),
    ...(spec.profiles === undefined ? {} : { profiles: spec.profiles }),
    parts: spec.parts,
    ...(spec.discretes === undefined ? {} : { discretes: spec.discretes }),
    nets: spec.nets ?? [],
  };
}

export function part(id: string, railId: string, profile: string, pins: Pin[], extra: Partial<Part> = {}): Part {
  return { id, label: id, rail: railId, profile, pins, ...extra };
}

export const input = (id: string, extra: Partial<Pin> = {}): Pin => ({ id, role: 'input', ...extra });
export const output = (id: string, extra: Partial<Pin> = {}): Pin => ({ id, role: 'output', ...extra });
export const bidir = (id: string, extra: Partial<Pin> = {}): Pin => ({ id, role: 'bidir', ...extra });

export function net(id: string, pins: string[], extra: Partial<Net> = {}): Net {
  return { id, pins, ...extra };
}

export function scenario(id: string, off: string[], label = id): Scenario {
  return { id, label, off };
}

/** The common two-part link: `D.Y` (an output) drives `R.A` (an input) on net `N`. */
export function link(
  driver: { rail: string; profile: string; pin?: Partial<Pin>; part?: Partial<Part> },
  receiver: { rail: string; profile: string; pin?: Partial<Pin>; part?: Partial<Part> },
  spec: Omit<DesignSpec, 'parts' | 'nets'> & { net?: Partial<Net>; extraParts?: Part[]; extraPins?: string[] } = {},
): Design {
  const { net: netExtra, extraParts = [], extraPins = [], ...rest } = spec;
  return design({
    ...rest,
    parts: [
      part('D', driver.rail, driver.profile, [output('Y', driver.pin)], driver.part),
      part('R', receiver.rail, receiver.profile, [input('A', receiver.pin)], receiver.part),
      ...extraParts,
    ],
    nets: [net('N', ['D.Y', 'R.A', ...extraPins], netExtra)],
  });
}

/** A resistor part; `tie` sends an end to a rail or ground instead of a net. */
export function resistor(
  id: string,
  ohms: number,
  extra: Partial<Extract<Discrete, { kind: 'resistor' }>> = {},
): Discrete {
  return { id, kind: 'resistor', ohms, ...extra };
}

/** A bidirectional N-MOSFET shifter: S on the low side, D on the high side, the gate on `gate`. */
export function fetShifter(id: string, gate: string, vgsThMax: number, rdsOnMax: number): Discrete {
  return { id, kind: 'fet-shifter', gate, vgsThMax, rdsOnMax };
}

/** A Schottky diode shifter: K on the driver's net, A on the receiver's. */
export function diodeShifter(id: string, vfMax: number, leakageMax: number): Discrete {
  return { id, kind: 'diode-shifter', vfMax, leakageMax };
}
