/**
 * The ladder drawing, rendered to markup in Node: every band and margin carries the model's
 * number in its data attributes and its value and status in words (readable without colour).
 */
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '../../../app/example.ts';
import { VoltageLadder } from '../../../app/ladder/VoltageLadder.tsx';
import { check } from '../../../rules/check/check.ts';
import { ladderFor } from '../../../rules/report/ladder.ts';

const result = check(exampleDesign());
const ladderOf = (state: string, net: string) =>
  ladderFor(result.nets.get(state)!.get(net)!.view, result.states.find((s) => s.id === state)!);

/** Each element's attributes, for the elements that have a data-kind. */
function elements(markup: string): Record<string, string>[] {
  const out: Record<string, string>[] = [];
  for (const m of markup.matchAll(/<[a-z]+\s([^>]*data-kind="[^"]*"[^>]*)>/g)) {
    const attrs: Record<string, string> = {};
    for (const a of m[1]!.matchAll(/([a-z-]+)="([^"]*)"/g))
      attrs[a[1]!] = a[2]!.replace(/&gt;/g, '>').replace(/&amp;/g, '&');
    out.push(attrs);
  }
  return out;
}

/** The visible text of the drawing (titles included), entities decoded. */
function text(markup: string): string {
  return markup
    .replace(/<[^>]+>/g, '\n')
    .replace(/&gt;/g, '>')
    .replace(/&amp;/g, '&')
    .replace(/&lt;/g, '<');
}

describe('VoltageLadder', () => {
  it.each([
    ['all-on', 'VALVE_EN'],
    ['all-on', 'SDA'],
    ['all-on', 'STATUS'],
    ['standby', 'SDA'],
    ['all-on', 'SLEEP'],
    ['all-on', 'DISP_RX'],
  ])('%s %s: every band, threshold and margin of the model is drawn with its number', (state, net) => {
    const ladder = ladderOf(state, net);
    const els = elements(renderToStaticMarkup(<VoltageLadder ladder={ladder} />));
    const pick = (kind: string) => els.filter((e) => e['data-kind'] === kind);
    expect(pick('voh').map((e) => [e['data-pin'], Number(e['data-volts'])])).toEqual(
      ladder.drivers.filter((d) => d.high !== null).map((d) => [d.pin, d.high!.from]),
    );
    expect(pick('vol').map((e) => [e['data-pin'], Number(e['data-volts'])])).toEqual(
      ladder.drivers.filter((d) => d.low !== null).map((d) => [d.pin, d.low!.to]),
    );
    expect(pick('vih').map((e) => [e['data-pin'], Number(e['data-volts'])])).toEqual(
      ladder.receivers.filter((r) => r.vih !== null).map((r) => [r.pin, r.vih!.volts]),
    );
    expect(pick('vil').map((e) => [e['data-pin'], Number(e['data-volts'])])).toEqual(
      ladder.receivers.filter((r) => r.vil !== null).map((r) => [r.pin, r.vil!.volts]),
    );
    expect(pick('vimax').map((e) => [e['data-pin'], Number(e['data-volts'])])).toEqual(
      ladder.receivers.filter((r) => r.viMax !== null).map((r) => [r.pin, r.viMax!.volts]),
    );
    const margins = [...pick('nmh'), ...pick('nml')].map((e) => [
      e['data-kind'],
      e['data-driver'],
      e['data-receiver'],
      Number(e['data-margin']),
      e['data-status'],
    ]);
    expect(margins.sort()).toEqual(
      ladder.margins.map((m) => [m.kind, m.driver, m.receiver, m.margin, m.status]).sort(),
    );
    expect(pick('unpowered').map((e) => e['data-pin'])).toEqual(ladder.unpowered.map((p) => p.pin));
  });

  it('VALVE_EN: values in engineering notation and the failing margin in words', () => {
    const t = text(renderToStaticMarkup(<VoltageLadder ladder={ladderOf('all-on', 'VALVE_EN')} />));
    // 3.135 − 0.2 V; 0.675 × 5.25 + 0.15 V (JESD7 line); margin −0.759 V; VIL 0.325 × 4.75 − 0.15 V;
    // levels to four digits, margins to three.
    for (const s of [
      'VOH ≥ 2.935 V',
      'VDD 3.135 V',
      'VIH 3.694 V',
      'NMH -0.759 V',
      'FAIL',
      'VIL 1.394 V',
      'NML 1.24 V',
      'pass',
      'max 5.25 V',
      'VOL ≤ 0.15 V',
      'All rails on',
    ]) {
      expect(t).toContain(s);
    }
  });

  it('standby SDA names the unpowered pin and its rail', () => {
    const t = text(renderToStaticMarkup(<VoltageLadder ladder={ladderOf('standby', 'SDA')} />));
    expect(t).toContain('unpowered: U2.SDA (1v8 off)');
    expect(t).toContain('Vpull 3.135 V');
  });

  it('names rails by the labels it is given (one name for one thing), ids only without them', () => {
    const rails = new Map(exampleDesign().rails.map((r) => [r.id, r.label ?? r.id]));
    const t = text(
      renderToStaticMarkup(
        <VoltageLadder ladder={ladderOf('standby', 'SDA')} railName={(id) => rails.get(id) ?? id} />,
      ),
    );
    expect(t).toContain('unpowered: U2.SDA (1.8 V sensor supply off)');
    expect(t).toContain('3.3 V controller I/O');
    expect(t).not.toMatch(/· 3v3\b|\(1v8 off\)/);
  });

  it('two ladders on one page use distinct pattern ids', () => {
    const markup = renderToStaticMarkup(
      <>
        <VoltageLadder ladder={ladderOf('all-on', 'VALVE_EN')} />
        <VoltageLadder ladder={ladderOf('all-on', 'SDA')} />
      </>,
    );
    const ids = [...markup.matchAll(/<pattern id="([^"]+)"/g)].map((m) => m[1]);
    expect(ids.length).toBe(6);
    expect(new Set(ids).size).toBe(6);
  });
});
