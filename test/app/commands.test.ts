/**
 * Every command of the editor as a table: what it changes, that one undo takes it back and one
 * redo brings it again, and what it refuses.
 */
import { describe, expect, it } from 'vitest';
import {
  addPart,
  addPowerState,
  addRail,
  deletePowerState,
  deleteRail,
  moveParts,
  replaceDesign,
  setNetLabel,
  setNetMaxRiseTime,
  setNetPull,
  setNetWiringCapacitance,
  setPartLabel,
  setPartProfile,
  setPartRail,
  setPowerStateLabel,
  setRailColour,
  setRailLabel,
  setRailOff,
  setRailTolerance,
  setRailVoltage,
  setTitle,
  type Command,
} from '../../app/store/commands/index.ts';
import type { Design } from '../../rules/model/schema.ts';
import { newDesign } from '../../rules/model/newDesign.ts';
import { validateDesign } from '../../rules/model/reader.ts';
import { input, net, part, rail1v8, rail2v5, rail3v3, rail5v0, scenario } from '../support/build.ts';
import { bench, harness } from './harness.ts';

const start = bench({
  rails: [rail5v0, rail3v3, rail1v8, rail2v5],
  nets: [net('A', ['D.Y1', 'H.A'], { waivers: [{ rule: 'level-high', scenario: 'S1', note: 'only in standby' }] })],
  scenarios: [scenario('S1', ['1v8', '2v5'], 'Standby')],
});

interface Case {
  name: string;
  command: Command;
  /** Reads the changed value from the design. */
  read: (d: Design) => unknown;
  after: unknown;
}

const cases: Case[] = [
  { name: 'setTitle', command: setTitle('Pump panel'), read: (d) => d.title, after: 'Pump panel' },
  {
    name: 'addPart',
    command: addPart(part('U9', '3v3', 'lvcmos33', [input('A')], { position: { x: 10, y: 20 } })),
    read: (d) => d.parts.map((p) => p.id),
    after: ['D', 'H', 'T', 'S', 'U9'],
  },
  {
    name: 'moveParts, two parts in one step',
    command: moveParts([
      { id: 'D', x: 100.4, y: 40 },
      { id: 'H', x: -20, y: 7.6 },
    ]),
    read: (d) => d.parts.slice(0, 2).map((p) => p.position),
    after: [
      { x: 100, y: 40 },
      { x: -20, y: 8 },
    ],
  },
  {
    name: 'setPartLabel',
    command: setPartLabel('H', 'Valve gate'),
    read: (d) => d.parts[1]!.label,
    after: 'Valve gate',
  },
  { name: 'setPartRail', command: setPartRail('H', '3v3'), read: (d) => d.parts[1]!.rail, after: '3v3' },
  { name: 'setPartProfile', command: setPartProfile('H', '74hct'), read: (d) => d.parts[1]!.profile, after: '74hct' },
  { name: 'setNetLabel', command: setNetLabel('A', ' EN '), read: (d) => d.nets[0]!.label, after: 'EN' },
  {
    name: 'setNetPull',
    command: setNetPull('A', { to: '5v0', ohms: 4700 }),
    read: (d) => d.nets[0]!.pull,
    after: { to: '5v0', ohms: 4700 },
  },
  {
    name: 'setNetPull to ground',
    command: setNetPull('A', { to: 'ground', ohms: 100e3 }),
    read: (d) => d.nets[0]!.pull,
    after: { to: 'ground', ohms: 100e3 },
  },
  {
    name: 'addRail',
    command: addRail(),
    read: (d) => d.rails.map((r) => r.id),
    after: ['5v0', '3v3', '1v8', '2v5', 'rail1'],
  },
  { name: 'setRailLabel', command: setRailLabel('3v3', 'Logic'), read: (d) => d.rails[1]!.label, after: 'Logic' },
  { name: 'setRailVoltage', command: setRailVoltage('3v3', 2.5), read: (d) => d.rails[1]!.nominal, after: 2.5 },
  { name: 'setRailTolerance', command: setRailTolerance('3v3', 0.1), read: (d) => d.rails[1]!.tolerance, after: 0.1 },
  {
    name: 'setRailColour',
    command: setRailColour('3v3', '#123abc'),
    read: (d) => d.rails[1]!.colour,
    after: '#123abc',
  },
  {
    name: 'deleteRail of an unused rail; power states forget it',
    command: deleteRail('2v5'),
    read: (d) => [d.rails.length, d.scenarios?.[0]?.off],
    after: [3, ['1v8']],
  },
  { name: 'addPowerState', command: addPowerState(), read: (d) => d.scenarios?.map((s) => s.id), after: ['S1', 'S2'] },
  {
    name: 'setPowerStateLabel',
    command: setPowerStateLabel('S1', 'Night'),
    read: (d) => d.scenarios?.[0]?.label,
    after: 'Night',
  },
  {
    name: 'setRailOff',
    command: setRailOff('S1', '5v0', true),
    read: (d) => d.scenarios?.[0]?.off,
    after: ['1v8', '2v5', '5v0'],
  },
  {
    name: 'setRailOff back on',
    command: setRailOff('S1', '1v8', false),
    read: (d) => d.scenarios?.[0]?.off,
    after: ['2v5'],
  },
  {
    name: 'deletePowerState, with the waivers that named it',
    command: deletePowerState('S1'),
    read: (d) => [d.scenarios, d.nets[0]!.waivers],
    after: [undefined, undefined],
  },
  {
    name: 'replaceDesign',
    command: replaceDesign(newDesign('Fresh')),
    read: (d) => [d.title, d.parts.length],
    after: ['Fresh', 0],
  },
];

const refusals: { name: string; command: Command; reason: RegExp }[] = [
  {
    name: 'addPart with a designator in use',
    command: addPart(part('H', '5v0', '74hc', [])),
    reason: /already a part H/,
  },
  {
    name: 'addPart with a "." in the designator',
    command: addPart(part('U.1', '5v0', '74hc', [])),
    reason: /cannot be a designator/,
  },
  { name: 'addPart on an unknown rail', command: addPart(part('U9', '12v', '74hc', [])), reason: /no rail 12v/ },
  { name: 'setPartRail to an unknown rail', command: setPartRail('H', '12v'), reason: /no rail 12v/ },
  { name: 'setPartProfile to an unknown profile', command: setPartProfile('H', '74xyz'), reason: /no profile 74xyz/ },
  { name: 'setPartLabel of an unknown part', command: setPartLabel('Q', 'x'), reason: /no part Q/ },
  {
    name: 'setNetPull of NaN ohms',
    command: setNetPull('A', { to: '5v0', ohms: Number.NaN }),
    reason: /positive value/,
  },
  { name: 'setNetPull of 0 Ω', command: setNetPull('A', { to: '5v0', ohms: 0 }), reason: /positive value/ },
  { name: 'setNetPull to an unknown rail', command: setNetPull('A', { to: '12v', ohms: 1e3 }), reason: /no rail 12v/ },
  { name: 'setRailVoltage of NaN', command: setRailVoltage('3v3', Number.NaN), reason: /above 0 V/ },
  { name: 'setRailVoltage of 0 V', command: setRailVoltage('3v3', 0), reason: /above 0 V/ },
  { name: 'setRailTolerance of 100 %', command: setRailTolerance('3v3', 1), reason: /between 0 % and 100 %/ },
  // The limits of the format (rules/model/limits.ts): the editor makes no design the reader would refuse.
  {
    name: 'setNetPull of 5e-324 Ω',
    command: setNetPull('A', { to: '5v0', ohms: 5e-324 }),
    reason: /from 1 mΩ to 1 TΩ/,
  },
  { name: 'setNetPull of 2 TΩ', command: setNetPull('A', { to: '5v0', ohms: 2e12 }), reason: /from 1 mΩ to 1 TΩ/ },
  {
    name: 'setNetWiringCapacitance of 5e-324 F',
    command: setNetWiringCapacitance('A', 5e-324),
    reason: /from 1 aF to 1 F/,
  },
  { name: 'setNetMaxRiseTime of an hour', command: setNetMaxRiseTime('A', 3600), reason: /from 1 fs to 1 s/ },
  { name: 'setRailVoltage of 1e307 V', command: setRailVoltage('3v3', 1e307), reason: /up to 10 kV/ },
  { name: 'setRailColour of markup', command: setRailColour('3v3', 'red;background:url(x)'), reason: /not a colour/ },
  { name: 'deleteRail of a rail in use', command: deleteRail('5v0'), reason: /still used by H/ },
  { name: 'setRailOff in an unknown state', command: setRailOff('S7', '5v0', true), reason: /no power state S7/ },
  { name: 'deletePowerState of an unknown state', command: deletePowerState('S7'), reason: /no power state S7/ },
];

describe('commands', () => {
  it.each(cases)(
    '$name: changes the design, one undo takes it back, one redo brings it again',
    ({ command, read, after }) => {
      const h = harness(start);
      const before = read(h.design);
      expect(before).not.toEqual(after);
      expect(h.apply(command)).toEqual({ ok: true, changed: true });
      expect(read(h.design)).toEqual(after);
      // Every command leaves a design the reader accepts.
      const valid = validateDesign(h.design);
      expect(valid.ok ? [] : valid.errors).toEqual([]);
      expect(h.undo()).toBe(true);
      expect(h.design).toEqual(start);
      expect(h.redo()).toBe(true);
      expect(read(h.design)).toEqual(after);
    },
  );

  it.each(refusals)('refuses $name', ({ command, reason }) => {
    const h = harness(start);
    const out = h.apply(command);
    expect(out.ok ? '' : out.reason).toMatch(reason);
    expect(h.design).toBe(start);
    expect(h.store.getState().past).toHaveLength(0);
  });
});
