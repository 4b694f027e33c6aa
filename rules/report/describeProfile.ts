/**
 * A profile's parameters in words and engineering notation, for `railcross profiles` and the
 * editor's profile list. Levels written as expressions of VDD are shown as written.
 */
import { formatQuantity } from '../levels/units.ts';
import type { OutputPoint, Params, Profile } from '../model/schema.ts';

type Level = NonNullable<Params['vih']>;

const level = (v: Level) => (typeof v === 'number' ? formatQuantity(v, 'V') : v);
const points = (list: readonly OutputPoint[]) =>
  list.map((p) => `${level(p.v)} at ${formatQuantity(p.i, 'A')}`).join('; ');

/** One `[name, value]` row per parameter the profile sets, in a fixed, readable order. */
export function describeParams(params: Params): [string, string][] {
  const rows: [string, string][] = [];
  const add = (name: string, value: string | undefined) => {
    if (value !== undefined) rows.push([name, value]);
  };
  const p = params;
  add('supply', p.vddRange && `${formatQuantity(p.vddRange[0], 'V')} to ${formatQuantity(p.vddRange[1], 'V')}`);
  add('VIH', p.vih === undefined ? undefined : level(p.vih));
  add('VIL', p.vil === undefined ? undefined : level(p.vil));
  add('Schmitt VT+ / VT−', p.schmitt && `${level(p.schmitt.vtPlus)} / ${level(p.schmitt.vtMinus)}`);
  add('VOH', p.voh && points(p.voh));
  add('VOL', p.vol && points(p.vol));
  add('IIH', p.iih === undefined ? undefined : formatQuantity(p.iih, 'A'));
  add('IIL', p.iil === undefined ? undefined : formatQuantity(p.iil, 'A'));
  add('CIN', p.cin === undefined ? undefined : formatQuantity(p.cin, 'F'));
  add('IO max', p.ioMax === undefined ? undefined : formatQuantity(p.ioMax, 'A'));
  add('VI max', p.viMax === undefined ? undefined : level(p.viMax));
  add('VI max unpowered', p.viMaxOff === undefined ? undefined : formatQuantity(p.viMaxOff, 'V'));
  add('safe unpowered', p.unpoweredSafe === undefined ? undefined : p.unpoweredSafe ? 'yes' : 'no');
  add('max input ramp', p.maxInputRamp === undefined ? undefined : formatQuantity(p.maxInputRamp, 's/V'));
  add(
    'ΔICC per input',
    p.deltaIcc === undefined
      ? undefined
      : `${formatQuantity(p.deltaIcc, 'A')}${p.deltaIccDrop === undefined ? '' : ` at VDD − ${formatQuantity(p.deltaIccDrop, 'V')}`}`,
  );
  return rows;
}

/** A profile as indented text lines: id and label, its parameters, its source. */
export function describeProfile(profile: Profile): string[] {
  const rows = describeParams(profile.params);
  const all: [string, string][] = [
    ...(rows.length === 0 ? [['parameters', 'none of its own: give the pin its levels'] as [string, string]] : rows),
    ['source', profile.source],
  ];
  const width = Math.max(...all.map(([name]) => name.length));
  return [`${profile.id}: ${profile.label}`, ...all.map(([name, value]) => `    ${name.padEnd(width)}  ${value}`)];
}
