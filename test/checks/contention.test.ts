import rule from '../../rules/checks/contention.ts';
import type { Pin } from '../../rules/model/schema.ts';
import { describe, expect, it } from 'vitest';
import { findingsOf, ruleTester } from '../support/ruleTester.ts';
import { bidir, design, input, net, output, part, rail, rail5v0, scenario } from '../support/build.ts';

// Common practice: two enabled push-pull outputs on one net fight; open-drain outputs may share a
// net; three-state outputs may share one only with mutually exclusive enables.

/** Parts `A`, `B`, … each with one driving pin `Y`, and a receiver `R.A`, all on 5 V, on net `N`. */
function shared(
  pins: Pin[],
  extra: { net?: Parameters<typeof net>[2]; scenarios?: ReturnType<typeof scenario>[] } = {},
) {
  const ids = pins.map((_, k) => String.fromCharCode(65 + k));
  return design({
    rails: [rail5v0, rail('aux', 5, { tolerance: 0.05 })],
    parts: [
      ...pins.map((p, k) => part(ids[k]!, p.rail ?? '5v0', '74hc', [{ ...p, id: 'Y' }])),
      part('R', '5v0', '74hc', [input('A')]),
    ],
    nets: [net('N', [...ids.map((id) => `${id}.Y`), 'R.A'], extra.net)],
    ...(extra.scenarios === undefined ? {} : { scenarios: extra.scenarios }),
  });
}

const pushPull = output('Y');
const threeState = output('Y', { drive: 'three-state' });
const openDrain = output('Y', { drive: 'open-drain' });

ruleTester(rule, {
  valid: [
    { name: 'one push-pull output', design: shared([pushPull]) },
    { name: 'one three-state output', design: shared([threeState]) },
    {
      name: 'open-drain outputs share a net',
      design: shared([openDrain, openDrain, openDrain], { net: { pull: { to: '5v0', ohms: 4700 } } }),
    },
    { name: 'a bidir pin alone', design: shared([bidir('Y')]) },
    {
      name: 'inputs do not drive',
      design: design({
        parts: [
          part('A', '5v0', '74hc', [output('Y')]),
          part('B', '5v0', '74hc', [input('A')]),
          part('C', '5v0', '74hc', [input('A')]),
        ],
        nets: [net('N', ['A.Y', 'B.A', 'C.A'])],
      }),
    },
  ],
  invalid: [
    {
      name: 'two push-pull outputs',
      design: shared([pushPull, pushPull]),
      findings: [
        {
          messageId: 'pushPullFight',
          severity: 'error',
          id: 'contention:N:all-on',
          pins: ['A.Y', 'B.Y'],
          values: { drivers: ['A.Y', 'B.Y'], kinds: ['push-pull', 'push-pull'] },
        },
      ],
    },
    {
      name: 'a push-pull with an open-drain output',
      design: shared([pushPull, openDrain], { net: { pull: { to: '5v0', ohms: 4700 } } }),
      findings: [{ messageId: 'pushPullFight', severity: 'error', values: { kinds: ['push-pull', 'open-drain'] } }],
    },
    {
      name: 'a push-pull with a three-state output',
      design: shared([threeState, pushPull]),
      findings: [
        {
          messageId: 'pushPullFight',
          severity: 'error',
          values: { drivers: ['A.Y', 'B.Y'], kinds: ['three-state', 'push-pull'] },
        },
      ],
    },
    {
      name: 'two three-state outputs need exclusive enables',
      design: shared([threeState, threeState]),
      findings: [
        {
          messageId: 'enablesNeeded',
          severity: 'warning',
          id: 'contention:N:all-on',
          values: { drivers: ['A.Y', 'B.Y'], kinds: ['three-state', 'three-state'] },
        },
      ],
    },
    {
      name: 'a three-state with an open-drain output',
      design: shared([openDrain, threeState], { net: { pull: { to: '5v0', ohms: 4700 } } }),
      findings: [{ messageId: 'enablesNeeded', severity: 'warning', values: { kinds: ['open-drain', 'three-state'] } }],
    },
    {
      // design-format.md: a bidir pin's default drive is three-state.
      name: 'two bidir pins default to three-state',
      design: shared([bidir('Y'), bidir('Y')]),
      findings: [
        { messageId: 'enablesNeeded', severity: 'warning', values: { kinds: ['three-state', 'three-state'] } },
      ],
    },
    {
      name: 'two outputs of the same part count like any others',
      design: design({
        parts: [part('U', '5v0', '74hc', [output('Y1'), output('Y2'), input('A')])],
        nets: [net('N', ['U.Y1', 'U.Y2', 'U.A'])],
      }),
      findings: [{ messageId: 'pushPullFight', severity: 'error', values: { drivers: ['U.Y1', 'U.Y2'] } }],
    },
    {
      // With B's rail off, B drives nothing and the net has one driver.
      name: 'a driver on an off rail does not count',
      design: shared([pushPull, output('Y', { rail: 'aux' })], { scenarios: [scenario('b-off', ['aux'])] }),
      findings: [{ messageId: 'pushPullFight', severity: 'error', scenario: 'all-on' }],
    },
    {
      // The warning is meant to be waived once the enables are known to exclude each other; a
      // waiver for one scenario leaves the others standing.
      name: 'a waiver marks the finding in the states it names',
      design: shared([threeState, threeState], {
        net: { waivers: [{ rule: 'contention', scenario: 'all-on', note: 'enables decoded from one address line' }] },
        scenarios: [scenario('aux-off', ['aux'])],
      }),
      findings: [
        {
          messageId: 'enablesNeeded',
          severity: 'warning',
          scenario: 'all-on',
          waived: 'enables decoded from one address line',
        },
        { messageId: 'enablesNeeded', severity: 'warning', scenario: 'aux-off' },
      ],
    },
  ],
});

// The tester cannot say "not waived"; this table can.
describe('contention waivers by scenario', () => {
  const d = shared([threeState, threeState], {
    net: { waivers: [{ rule: 'contention', scenario: 'aux-off', note: 'aux off: one side disabled' }] },
    scenarios: [scenario('aux-off', ['aux'])],
  });
  it.each([
    { scenario: 'all-on', waived: undefined },
    { scenario: 'aux-off', waived: 'aux off: one side disabled' },
  ])('$scenario: waived = $waived', ({ scenario: id, waived }) => {
    const f = findingsOf(rule, d).find((x) => x.scenario === id);
    expect(f?.messageId).toBe('enablesNeeded');
    expect(f?.waived).toBe(waived);
  });
});
