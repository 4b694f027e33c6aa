/**
 * The example design holds exactly its planted faults at error level, each with the numbers
 * and the corner it was judged at.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { readDesign } from '../../rules/model/reader.ts';
import { check } from '../../rules/engine/check.ts';

const text = readFileSync(new URL('../../rules/examples/greenhouse.json', import.meta.url), 'utf8');

// 74HC VIH line 0.675·VDD + 0.15 (JESD7 as restated); the controller's VOH row VDD − 0.2 at
// 100 µA is the example's own (invented) datasheet value.
const planted: { id: string; values: Record<string, number | null> }[] = [
  // The 3.3 V bus pull-ups reach the 1.8 V sensor's pins: 3.465 V against VDD + 0.5 at 1.71 V.
  { id: 'overvoltage:SDA:all-on:U2.SDA', values: { vNet: 3.465, viMax: 1.71 + 0.5 } },
  { id: 'overvoltage:SCL:all-on:U2.SCL', values: { vNet: 3.465, viMax: 1.71 + 0.5 } },
  // A 3.3 V output into an HC input on the 5 V valve board.
  {
    id: 'level-high:VALVE_EN:all-on:U1.VALVE_EN>U3.EN',
    values: { voh: 3.135 - 0.2, vih: 0.675 * 5.25 + 0.15, driverVdd: 3.135, receiverVdd: 5.25 },
  },
  // The 5 V display's push-pull output into the controller's 3.3 V input.
  { id: 'overvoltage:DISP_RX:all-on:U1.DISP_RX', values: { vNet: 5.25, viMax: 3.135 + 0.5 } },
];

describe('greenhouse irrigation controller example', () => {
  const read = readDesign(text);
  it('is a valid design file', () => {
    expect(read.ok ? [] : read.errors).toEqual([]);
  });
  const design = read.ok ? read.design : (JSON.parse(text) as never);
  const result = check(design);

  it('has exactly the planted faults at error level', () => {
    const errors = result.findings.filter((f) => f.severity === 'error' && f.waived === undefined).map((f) => f.id);
    expect([...errors].sort()).toEqual(planted.map((p) => p.id).sort());
  });

  it.each(planted)('$id carries its numbers and corner', ({ id, values }) => {
    const f = result.findings.find((x) => x.id === id)!;
    expect(f, id).toBeDefined();
    for (const [k, v] of Object.entries(values)) {
      if (v === null) expect(f.values[k]).toBeNull();
      else expect(f.values[k] as number, `${id} ${k}`).toBeCloseTo(v, 9);
    }
    expect(f.message).toMatch(/\d/);
  });
});
