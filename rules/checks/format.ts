/** Numbers in findings' messages, in engineering notation (the file itself keeps SI numbers). */
import { formatMargin, formatQuantity } from '../levels/units.ts';

export const volts = (v: number) => formatQuantity(v, 'V');
/** A noise margin: a difference of two levels, to three digits. */
export const marginVolts = (v: number) => formatMargin(v);
export const amps = (i: number) => formatQuantity(i, 'A');
export const ohms = (r: number) => formatQuantity(r, 'Ω');
export const farads = (c: number) => formatQuantity(c, 'F');
export const seconds = (t: number) => formatQuantity(t, 's');
export const rampUnit = (r: number) => formatQuantity(r, 's/V');

/** "at 3.0 V / 5.5 V" style corner text: the driver's and the receiver's supply. */
export function cornerText(driverVdd: number | null, receiverVdd: number): string {
  return driverVdd === null
    ? `receiver supply ${volts(receiverVdd)}`
    : `driver supply ${volts(driverVdd)}, receiver supply ${volts(receiverVdd)}`;
}
