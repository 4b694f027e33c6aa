/**
 * floating-input: a powered receiver that nothing holds at a level: a net with no powered driver
 * and no pull, a net whose powered drivers are all three-state and has no pull, or an input pin
 * on no net without an internal pull (rules-catalogue.md).
 */
import { defineRule } from './defineRule.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface NetData {
  net: string;
  pins: string[];
  drivers: string[];
}

interface PinData {
  pin: string;
}

const plural = (n: number, one: string, many: string) => (n === 1 ? one : many);

export default defineRule({
  id: 'floating-input',
  meta: {
    title: 'No input is left floating',
    severity: {
      error: 'for a net with no powered driver and no pull',
      warning: 'for three-state-only nets and unconnected inputs',
    },
    explanation:
      'A CMOS input that nothing drives drifts to an undefined level, draws shoot-through current and ' +
      'may oscillate. A net with a powered receiver needs a powered driver or a pull resistor; a net ' +
      'whose only drivers are three-state floats whenever none is enabled, unless a pull holds it. Any ' +
      "pull counts here, the net's own, one inside a pin or a resistor part tied to a rail or ground, even " +
      'to a rail that is off. A driver on another net that reaches this one through a series resistor or a ' +
      'shifter drives it too, and a powered bus-hold input keeps the net at its last level. An input pin ' +
      'on no net, on a powered rail and without an internal pull, floats too.',
    hint: 'Add a pull resistor to a defined level, or tie the unused input to ground or its rail.',
    messages: {
      noDriver: (d: NetData) =>
        `Nothing drives ${d.net} and it has no pull resistor: ${d.pins.join(', ')} ${plural(d.pins.length, 'floats', 'float')}.`,
      allThreeState: (d: NetData) =>
        `${d.net} is driven only by ${plural(d.drivers.length, 'a three-state output', 'three-state outputs')} ` +
        `(${d.drivers.join(', ')}) and has no pull resistor: ${d.pins.join(', ')} ${plural(d.pins.length, 'floats', 'float')} while none is enabled.`,
      unusedInput: (d: PinData) => `${d.pin} is on no net and has no internal pull: the unused input floats.`,
    },
  },
  checkNet(view, report) {
    if (view.receivers.length === 0 || view.pulls.length > 0) return;
    if (view.pins.some((p) => p.powered && p.params.busHold !== undefined)) return;
    const drivers = [...view.drivers, ...view.remoteDrivers];
    const allThreeState = drivers.length > 0 && drivers.every((d) => d.drive === 'three-state');
    if (drivers.length > 0 && !allThreeState) return;
    const pins = view.receivers.map((r) => r.key);
    const driverKeys = drivers.map((d) => d.key);
    report({
      messageId: allThreeState ? 'allThreeState' : 'noDriver',
      data: { net: view.names.net(view.net.id), pins, drivers: driverKeys },
      severity: allThreeState ? 'warning' : 'error',
      pins,
      parts: partsOf(...pins),
      ...(allThreeState ? { hint: 'Add a pull resistor, or make sure one of the outputs is always enabled.' } : {}),
      values: { pins, ...(allThreeState ? { drivers: driverKeys } : {}) },
    });
  },
  checkPin({ pin }, report) {
    if (pin.role !== 'input' || !pin.powered || pin.pull !== undefined) return;
    report({
      messageId: 'unusedInput',
      data: { pin: pin.key },
      severity: 'warning',
      pins: [pin.key],
      parts: partsOf(pin.key),
      subject: pin.key,
      hint: 'Tie the unused input to ground or its rail, directly or through a resistor.',
      values: { pins: [pin.key] },
    });
  },
});
