/**
 * The rule tester catches what a planted rule does wrong: a rule that changes the view it is
 * given (views are shared across power states and read by the editor), and a rule that reports a
 * severity its meta does not declare (the engine's types hold real rules to it; this holds the
 * runtime, for rules written with casts).
 */
import { describe, expect, it } from 'vitest';
import { defineRule, type AnyRule } from '../../rules/checks/defineRule.ts';
import type { Severity } from '../../rules/engine/types.ts';
import { findingsOf } from './ruleTester.ts';
import { bidir, design, net, part } from './build.ts';

const bus = design({
  parts: [
    part('M', '3v3', 'i2c', [bidir('SDA', { drive: 'open-drain' })]),
    part('S', '3v3', 'i2c', [bidir('SDA', { drive: 'open-drain' })]),
  ],
  nets: [net('SDA', ['M.SDA', 'S.SDA'], { pull: { to: '3v3', ohms: 4700 } })],
});

function planted(body: (view: never) => void, severity: Severity = 'warning'): AnyRule {
  return defineRule({
    id: 'edge-rate',
    meta: { title: 'planted', severity: { warning: '' }, explanation: 'x', hint: 'x', messages: { m: () => 'm' } },
    checkNet(view, report) {
      body(view as never);
      report({
        messageId: 'm',
        data: undefined,
        severity: severity as 'warning',
        pins: [],
        parts: [],
        values: { riseTime: 1e-9, span: '10-90', capacitance: 1e-12, resistance: 1e3, limit: 1e-6, driver: null },
      });
    },
  });
}

describe('the rule tester', () => {
  it.each([
    ['reverses view.pins', (v: { pins: unknown[] }) => v.pins.reverse()],
    [
      'empties view.analysis.pairs',
      (v: { analysis: { pairs: unknown[] } }) => {
        v.analysis.pairs.length = 0;
      },
    ],
    ['sets a load in view.loads', (v: { loads: Map<string, unknown> }) => v.loads.set('X', { high: 0, low: 0 })],
    [
      'deletes a rail from view.rails.ranges',
      (v: { rails: { ranges: Map<string, unknown> } }) => v.rails.ranges.delete('3v3'),
    ],
    [
      'writes a pin field',
      (v: { pins: { key: string }[] }) => {
        v.pins[0]!.key = 'Z.Z';
      },
    ],
  ])('fails a rule that %s', (_name, body) => {
    expect(() => findingsOf(planted(body as (v: never) => void), bus)).toThrow(TypeError);
  });

  it('fails a rule that reports a severity it does not declare', () => {
    expect(() =>
      findingsOf(
        planted(() => {}, 'error'),
        bus,
      ),
    ).toThrow(/does not declare/);
  });

  it('passes the same rule when it only reads and keeps to its severities', () => {
    expect(
      findingsOf(
        planted((v: { pins: unknown[] }) => v.pins.length),
        bus,
      ).map((f) => f.severity),
    ).toEqual(['warning']);
  });
});
