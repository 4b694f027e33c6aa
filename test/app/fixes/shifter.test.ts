/**
 * The FET-shifter fix: the 3.3 V controller and 1.8 V two-wire sensor on one open-drain
 * net pulled up to 3.3 V (the sensor's pins see 3.465 V against VDD + 0.5 = 2.21 V) get a
 * direct remedy: the net split at a bidirectional N-MOSFET shifter, a pull-up per side.
 */
import { describe, expect, it } from 'vitest';
import { fixesFor } from '../../../app/store/commands/fixes/index.ts';
import { tryOn } from '../../../app/store/commands/fixes/preview.ts';
import { check } from '../../../rules/check/check.ts';
import { valuesOf } from '../../../rules/engine/findings.ts';
import { validateDesign } from '../../../rules/model/reader.ts';
import type { Design } from '../../../rules/model/schema.ts';
import { fetBus } from '../../support/paths.ts';
import { net } from '../../support/build.ts';
import { exampleDesign } from '../../../app/example.ts';

/** The case before the remedy: one net, one pull-up to 3.3 V. */
function oneNet(): Design {
  const d = fetBus();
  return {
    ...d,
    discretes: undefined,
    nets: [net('SDA', ['U1.SDA', 'U2.SDA'], { pull: { to: '3v3', ohms: 4700 } })],
  } as unknown as Design;
}

describe('FET shifter fix', () => {
  it("is offered for the sensor's over-voltage and leaves a passing shifted bus", () => {
    const d = JSON.parse(JSON.stringify(oneNet())) as Design;
    const before = check(d);
    const over = before.findings.find((f) => f.id === 'overvoltage:SDA:all-on:U2.SDA');
    expect(valuesOf(over!, 'overvoltage').vNet).toBeCloseTo(3.465, 9);
    const fix = fixesFor(over!, d, before).find((f) => f.id === 'fet-shifter');
    expect(fix?.title).toBe('Insert FET shifter Q1 on SDA');
    const after = tryOn(d, fix!.apply);
    expect(after.refused).toBeUndefined();
    const read = validateDesign(after.design);
    expect(read.ok ? [] : read.errors).toEqual([]);
    const result = check(after.design);
    const errors = result.findings.filter((f) => f.severity === 'error');
    expect(errors.map((f) => f.id)).toEqual([]);
    // Split: the 1.8 V sensor on SDA_1v8 with its own pull-up to 1.8 V, the controller on SDA with one to 3.3 V.
    expect(after.design.nets.map((n) => [n.id, [...n.pins].sort()])).toEqual([
      ['SDA', ['Q1.D', 'R2.1', 'U1.SDA']],
      ['SDA_1v8', ['Q1.S', 'R1.1', 'U2.SDA']],
    ]);
    const ties = (after.design.discretes ?? []).map((x) =>
      x.kind === 'resistor' ? `${x.id}→${x.tie?.['2']}` : `${x.id} gate ${x.kind === 'fet-shifter' ? x.gate : ''}`,
    );
    expect(ties.sort()).toEqual(['Q1 gate 1v8', 'R1→1v8', 'R2→3v3']);
    // Each pull-up is inside its pull-range (info, not error).
    expect(result.findings.filter((f) => f.rule === 'pull-range').map((f) => f.severity)).toEqual(['info', 'info']);
  });

  it('is not offered for a net with a push-pull driver', () => {
    const d = exampleDesign();
    const r = check(d);
    const f = r.findings.find((x) => x.id === 'overvoltage:DISP_RX:all-on:U1.DISP_RX')!;
    expect(fixesFor(f, d, r).map((x) => x.id)).not.toContain('fet-shifter');
  });

  it("is offered on the example's 1.8 V soil sensor bus", () => {
    const d = exampleDesign();
    const r = check(d);
    const f = r.findings.find((x) => x.id === 'overvoltage:SDA:all-on:U2.SDA')!;
    expect(fixesFor(f, d, r).map((x) => x.id)).toContain('fet-shifter');
  });
});
