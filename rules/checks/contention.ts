/**
 * contention: outputs that can fight over one net, judged on its powered drivers counted by kind
 * (rules-catalogue.md).
 */
import type { PinDrive } from '../model/schema.ts';
import { defineRule } from './defineRule.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  drivers: string[];
  kinds: PinDrive[];
}

const list = (d: Data) => d.drivers.map((k, n) => `${k} (${d.kinds[n]})`).join(', ');

export default defineRule({
  id: 'contention',
  meta: {
    title: 'No two outputs fight over a net',
    severity: {
      error: 'for a push-pull output sharing a net with any other driver',
      warning: 'for three-state outputs that need exclusive enables',
    },
    explanation:
      'A push-pull output always drives: on a net with another powered push-pull output, or with a ' +
      'three-state or open-drain one, the two can drive opposite levels and short the supplies through ' +
      'their output stages. Three-state outputs, or a three-state with an open-drain one, may share a ' +
      'net only while at most one is enabled (and an open-drain never pulls low while a three-state ' +
      'drives high); the rule cannot see the enables, so it warns, and the warning is meant to be ' +
      'waived with a note once the design guarantees it. Open-drain outputs alone may share a net.',
    hint:
      'Give each push-pull output its own net, or use three-state or open-drain outputs with an enable ' +
      'scheme that lets only one drive at a time.',
    messages: {
      pushPullFight: (d: Data) =>
        `${d.drivers.length} drivers share this net and a push-pull output always drives: ${list(d)}.`,
      enablesNeeded: (d: Data) =>
        `${d.drivers.length} drivers share this net and can drive at once unless their enables exclude each other: ${list(d)}.`,
    },
  },
  checkNet(view, report) {
    const drivers = view.drivers.filter((d) => d.drive !== undefined);
    const count = (kind: PinDrive) => drivers.filter((d) => d.drive === kind).length;
    const pushPull = count('push-pull');
    const threeState = count('three-state');
    const openDrain = count('open-drain');
    const fight = pushPull >= 2 || (pushPull >= 1 && drivers.length >= 2);
    const shared = threeState >= 2 || (threeState >= 1 && openDrain >= 1);
    if (!fight && !shared) return;
    const data: Data = { drivers: drivers.map((d) => d.key), kinds: drivers.map((d) => d.drive!) };
    report({
      messageId: fight ? 'pushPullFight' : 'enablesNeeded',
      data,
      severity: fight ? 'error' : 'warning',
      pins: data.drivers,
      parts: partsOf(...data.drivers),
      ...(fight
        ? {}
        : { hint: 'Make sure only one output is enabled at a time, then waive this with a note saying how.' }),
      values: { drivers: data.drivers, kinds: data.kinds },
    });
  },
});
