/** Parameters typed in engineering notation with units, or as Levels of VDD, and shown back the same way. */
import { describe, expect, it } from 'vitest';
import { formatParam, parseParam, PARAM_FIELDS, withParam, type ParamKey } from '../../app/store/paramFields.ts';
import { ParamsSchema } from '../../rules/model/schema.ts';

const accepted: { key: ParamKey; text: string; value: unknown; shown: string }[] = [
  // 2.0 V: the TTL-level VIH (JESD7, 74HCT input levels).
  { key: 'vih', text: '2.0', value: 2, shown: '2 V' },
  { key: 'vih', text: '2 V', value: 2, shown: '2 V' },
  // 0.7·VDD: the usual CMOS input-high threshold (JESD7, 74HC input levels, from memory).
  { key: 'vih', text: '0.7*VDD', value: '0.7*VDD', shown: '0.7*VDD' },
  { key: 'vil', text: '0.3 * vdd', value: '0.3 * VDD', shown: '0.3 * VDD' },
  { key: 'viMax', text: 'VDD+0.5', value: 'VDD+0.5', shown: 'VDD+0.5' },
  // 3V3: a rail written with the unit as its decimal point (common practice).
  { key: 'viMax', text: '3V3', value: 3.3, shown: '3.3 V' },
  // 1.6 mA: a standard TTL input's low-level current (handbook value, from memory).
  { key: 'iil', text: '1.6m', value: 1.6e-3, shown: '1.6 mA' },
  { key: 'iih', text: '1 µA', value: 1e-6, shown: '1 µA' },
  { key: 'cin', text: '5pF', value: 5e-12, shown: '5 pF' },
  { key: 'ioMax', text: '25 mA', value: 25e-3, shown: '25 mA' },
  { key: 'maxInputRamp', text: '10 ns/V', value: 10e-9, shown: '10 ns/V' },
  // ΔICC of a TTL-input CMOS part, about 0.5 mA per input at VCC − 2.1 V (from memory).
  { key: 'deltaIcc', text: '0.5 mA', value: 0.5e-3, shown: '500 µA' },
  { key: 'deltaIccDrop', text: '2.1', value: 2.1, shown: '2.1 V' },
  { key: 'viMaxOff', text: '3.6', value: 3.6, shown: '3.6 V' },
  { key: 'unpoweredSafe', text: 'Yes', value: true, shown: 'yes' },
  { key: 'unpoweredSafe', text: 'no', value: false, shown: 'no' },
  // JESD8C LVCMOS: VOH ≥ VDD − 0.2 V at 100 µA.
  { key: 'voh', text: 'VDD-0.2 @ 100u', value: [{ v: 'VDD-0.2', i: 100e-6 }], shown: 'VDD-0.2 @ 100 µA' },
  {
    key: 'vol',
    text: '0.2 @ 100µA; 0.4 V @ 4 mA',
    value: [
      { v: 0.2, i: 100e-6 },
      { v: 0.4, i: 4e-3 },
    ],
    shown: '0.2 V @ 100 µA; 0.4 V @ 4 mA',
  },
  {
    key: 'schmitt',
    text: '0.7*VDD / 0.3*VDD',
    value: { vtPlus: '0.7*VDD', vtMinus: '0.3*VDD' },
    shown: '0.7*VDD / 0.3*VDD',
  },
  // JESD8C LVCMOS 3.3 V normal supply range, 3.0 V to 3.6 V.
  { key: 'vddRange', text: '3 … 3.6', value: [3, 3.6], shown: '3 V … 3.6 V' },
  { key: 'vddRange', text: '3V to 3.6V', value: [3, 3.6], shown: '3 V … 3.6 V' },
  // Version 2. −0.5 V: a clamped CMOS input's lowest (common practice).
  { key: 'viMin', text: '-0.5', value: -0.5, shown: '-0.5 V' },
  // A few mA of injection current, as datasheets give it (from memory).
  { key: 'injectionMax', text: '2m', value: 2e-3, shown: '2 mA' },
  // Bus-hold: 75 µA hold, 500 µA overdrive (datasheet convention, from memory).
  { key: 'busHold', text: '75u / 500u', value: { hold: 75e-6, overdrive: 500e-6 }, shown: '75 µA / 500 µA' },
  { key: 'seriesResistance', text: '4k5', value: 4500, shown: '4.5 kΩ' },
  { key: 'minExternalPull', text: '50k', value: 50e3, shown: '50 kΩ' },
  { key: 'maxLoadCapacitance', text: '70p', value: 70e-12, shown: '70 pF' },
];

const refused: { key: ParamKey; text: string; error: RegExp }[] = [
  { key: 'vih', text: '0.7*VDD*VDD', error: /at most one VDD per term/ },
  { key: 'vih', text: '2 A', error: /expected a value in V, found a value in A/ },
  { key: 'vih', text: 'high', error: /not a known prefix or unit|expected a value in V/ },
  { key: 'iih', text: '-1u', error: /negative/ },
  { key: 'cin', text: '5 pV', error: /found a value in V|not a known/ },
  { key: 'voh', text: 'VDD-0.2', error: /expected "level @ current"/ },
  { key: 'voh', text: '', error: /at least one/ },
  { key: 'schmitt', text: '0.7*VDD', error: /VT\+ \/ VT−/ },
  { key: 'unpoweredSafe', text: 'maybe', error: /yes or no/ },
  { key: 'vddRange', text: '3.6 … 3', error: /minimum is above the maximum/ },
  { key: 'busHold', text: '75u', error: /hold \/ overdrive/ },
  { key: 'busHold', text: '75u / 5 V', error: /overdrive:/ },
];

describe('parameter fields', () => {
  it('cover every key of Params', () => {
    expect(PARAM_FIELDS.map((f) => f.key).sort()).toEqual(Object.keys(ParamsSchema.shape).sort());
  });

  it.each(accepted)('$key: "$text" reads as the stored value and shows as "$shown"', ({ key, text, value, shown }) => {
    const read = parseParam(key, text);
    expect(read).toEqual({ ok: true, value });
    expect(formatParam(key, value)).toBe(shown);
    // What is shown reads back to the same value, and the format accepts it.
    expect(parseParam(key, shown)).toEqual({ ok: true, value });
    expect(ParamsSchema.safeParse({ [key]: value }).success).toBe(true);
  });

  it.each(refused)('$key: refuses "$text"', ({ key, text, error }) => {
    const read = parseParam(key, text);
    expect(read.ok ? '' : read.error).toMatch(error);
  });

  it('withParam sets and takes away one key, and leaves nothing when nothing is left', () => {
    expect(withParam(undefined, 'vih', 2)).toEqual({ vih: 2 });
    expect(withParam({ vih: 2, vil: 0.8 }, 'vih', undefined)).toEqual({ vil: 0.8 });
    expect(withParam({ vih: 2 }, 'vih', undefined)).toBeUndefined();
  });
});
