/**
 * A small bench of our own for the browser tests of the parts between chips (invented demo data):
 * a 3.3 V controller and a 1.8 V sensor on one open-drain two-wire line pulled up to 3.3 V (the
 * sensor's pin sees 3.465 V), a 5 V output straight into a clamped 3.3 V input that states its
 * injection limit, and spare pins to wire shifters between by hand.
 */
import type { Design } from '../rules/model/schema.ts';

export const CROSSING_BENCH: Design = {
  format: 'railcross.design',
  version: 2,
  title: 'Rail crossing bench',
  rails: [
    { id: '5v0', label: '5 V', nominal: 5 },
    { id: '3v3', label: '3.3 V', nominal: 3.3, minLoad: 2e-3 },
    { id: '1v8', label: '1.8 V', nominal: 1.8 },
  ],
  parts: [
    {
      id: 'U1',
      label: 'Bench controller',
      rail: '3v3',
      profile: 'i2c',
      position: { x: 0, y: 0 },
      pins: [{ id: 'SDA', role: 'bidir', drive: 'open-drain', side: 'right' }],
    },
    {
      id: 'U2',
      label: 'Bench sensor',
      rail: '1v8',
      profile: 'i2c-lv',
      position: { x: 520, y: 0 },
      pins: [{ id: 'SDA', role: 'bidir', drive: 'open-drain', side: 'left' }],
    },
    {
      id: 'U3',
      label: 'Motor board',
      rail: '5v0',
      profile: '74hc',
      position: { x: 0, y: 220 },
      pins: [{ id: 'Y', role: 'output', side: 'right' }],
    },
    {
      id: 'U4',
      label: 'Logger input',
      rail: '3v3',
      profile: 'lvcmos33',
      position: { x: 520, y: 220 },
      pins: [{ id: 'A', role: 'input', params: { injectionMax: 1e-3 } }],
    },
    {
      id: 'U5',
      label: 'Spare sensor port',
      rail: '1v8',
      profile: 'i2c-lv',
      position: { x: 0, y: 440 },
      pins: [{ id: 'SCL', role: 'bidir', drive: 'open-drain', side: 'right' }],
    },
    {
      id: 'U6',
      label: 'Spare host port',
      rail: '3v3',
      profile: 'i2c',
      position: { x: 520, y: 440 },
      pins: [{ id: 'SCL', role: 'bidir', drive: 'open-drain', side: 'left' }],
    },
    {
      id: 'U7',
      label: 'Spare 3.3 V output',
      rail: '3v3',
      profile: '74lvc',
      position: { x: 0, y: 660 },
      pins: [{ id: 'Y', role: 'output', side: 'right' }],
    },
    {
      id: 'U8',
      label: 'Spare 5 V input',
      rail: '5v0',
      profile: '74hct',
      position: { x: 520, y: 660 },
      pins: [{ id: 'A', role: 'input' }],
    },
  ],
  nets: [
    { id: 'SDA', pins: ['U1.SDA', 'U2.SDA'], pull: { to: '3v3', ohms: 4700 } },
    { id: 'TX', pins: ['U3.Y', 'U4.A'] },
  ],
};
