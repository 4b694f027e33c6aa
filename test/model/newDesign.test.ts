import { describe, expect, it } from 'vitest';
import { railRange } from '../../rules/levels/rails.ts';
import { newDesign, readDesign, validateDesign, writeDesign } from '../../rules/model/index.ts';

describe('newDesign', () => {
  it('passes the reader, as an object and through its written text', () => {
    const d = newDesign();
    expect(validateDesign(d)).toEqual({ ok: true, design: d });
    expect(readDesign(writeDesign(d))).toEqual({ ok: true, design: d });
  });

  // The three common logic supplies; ±5 % is common practice for a regulated logic rail.
  const rails: { id: string; nominal: number; min: number; max: number }[] = [
    { id: '5v0', nominal: 5, min: 4.75, max: 5.25 },
    { id: '3v3', nominal: 3.3, min: 3.135, max: 3.465 },
    { id: '1v8', nominal: 1.8, min: 1.71, max: 1.89 },
  ];
  it.each(rails)('has the $id rail at $nominal V, $min … $max V', ({ id, nominal, min, max }) => {
    const rail = newDesign().rails.find((r) => r.id === id);
    expect(rail?.nominal).toBe(nominal);
    const range = railRange(rail!);
    expect(range.min).toBeCloseTo(min, 12);
    expect(range.max).toBeCloseTo(max, 12);
  });

  it('has three rails with labels and distinct colours, no parts, no nets', () => {
    const d = newDesign();
    expect(d.rails).toHaveLength(3);
    expect(d.rails.every((r) => r.label.length > 0)).toBe(true);
    expect(new Set(d.rails.map((r) => r.colour)).size).toBe(3);
    expect(d.parts).toEqual([]);
    expect(d.nets).toEqual([]);
  });

  it('takes a title, defaulting to "Untitled design"', () => {
    expect(newDesign().title).toBe('Untitled design');
    expect(newDesign('Pump board').title).toBe('Pump board');
  });

  it('returns a fresh object each time', () => {
    const a = newDesign();
    a.rails[0]!.nominal = 12;
    expect(newDesign().rails[0]!.nominal).toBe(5);
  });
});
