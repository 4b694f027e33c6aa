/**
 * "Tie every unused input of this part": one step that gives each floating unused input of a
 * part its own pull, low to ground, or high to the part's rail for an input named active-low
 * (an unused CMOS input must sit at a defined level: common practice; an active-low input tied
 * low would assert).
 */
import { describe, expect, it } from 'vitest';
import { isActiveLowName, unusedInputsOf } from '../../../app/store/commands/fixes/pulls.ts';
import { design, input, net, output, part, rail3v3, rail5v0 } from '../../support/build.ts';
import { applyAndUndo, offered, pinOf } from './support.ts';

// A 16-pin controller of our own (demo data): a clock and a data line in use, the rest spare.
const controller = design({
  rails: [rail3v3, rail5v0],
  parts: [
    part('U1', '3v3', 'lvcmos33', [
      input('CLK'),
      input('D0'),
      input('D1'),
      input('D2'),
      input('EN_N'),
      input('CS#'),
      input('SEL', { pull: { to: '3v3', ohms: 47e3 } }),
      input('TP', { waivers: [{ rule: 'floating-input', note: 'test point, driven by the fixture' }] }),
      output('Q'),
    ]),
    part('G', '3v3', 'lvcmos33', [output('Y')]),
    part('V', '5v0', '74hc', [input('A'), input('B')]),
  ],
  nets: [net('N1', ['G.Y', 'U1.CLK'])],
});

describe('tie every unused input of a part', () => {
  it('names an input active-low by its suffix _N or #', () => {
    const cases: [string, boolean][] = [
      ['EN_N', true],
      ['reset_n', true],
      ['CS#', true],
      ['EN', false],
      ['N_EN', false],
      ['DIN', false],
    ];
    for (const [id, low] of cases) expect(isActiveLowName(id), id).toBe(low);
  });

  it('finds the inputs on no net and without a pull of their own', () => {
    // CLK is on a net, SEL has its own pull, TP's floating is accepted, Q is an output.
    expect(unusedInputsOf(controller, 'U1')).toEqual(['D0', 'D1', 'D2', 'EN_N', 'CS#']);
  });

  it('ties them all in one undo step: low to ground, the active-low ones high to the part rail', () => {
    const { after, fix } = applyAndUndo(
      controller,
      'floating-input:U1.D1:all-on',
      'tie-unused-inputs',
      ({ design: d }) => {
        for (const pin of ['U1.D0', 'U1.D1', 'U1.D2'])
          expect(pinOf(d, pin).pull, pin).toEqual({ to: 'ground', ohms: 10e3 });
        for (const pin of ['U1.EN_N', 'U1.CS#']) expect(pinOf(d, pin).pull, pin).toEqual({ to: '3v3', ohms: 10e3 });
        // The pin that had a pull and the one on a net are left as they were.
        expect(pinOf(d, 'U1.SEL').pull).toEqual({ to: '3v3', ohms: 47e3 });
        expect(pinOf(d, 'U1.CLK').pull).toBeUndefined();
        expect(pinOf(d, 'U1.TP').pull).toBeUndefined();
        // Another part's unused inputs are not this fix's business.
        expect(pinOf(d, 'V.A').pull).toBeUndefined();
      },
    );
    const floating = after.filter((f) => f.rule === 'floating-input').map((f) => [f.id, f.waived !== undefined]);
    expect(floating).toEqual([
      ['floating-input:U1.TP:all-on', true],
      ['floating-input:V.A:all-on', false],
      ['floating-input:V.B:all-on', false],
    ]);
    expect(fix.title).toBe('Tie all 5 unused inputs of U1 to defined levels');
    expect(fix.sentence).toContain('D0, D1, D2 low to ground');
    expect(fix.sentence).toContain('EN_N, CS# (active-low) high to 3.3 V');
  });

  it('is offered before the single tie, and only where two or more inputs are unused', () => {
    expect(offered(controller, 'floating-input:U1.D0:all-on')).toEqual(['tie-unused-inputs', 'pull-up', 'pull-down']);
    const one = design({
      rails: [rail3v3],
      parts: [part('U', '3v3', 'lvcmos33', [input('SPARE'), output('Y')])],
    });
    expect(offered(one, 'floating-input:U.SPARE:all-on')).toEqual(['pull-up', 'pull-down']);
  });
});
