/**
 * rail-injection: the clamp currents that series resistors let into the inputs on one rail,
 * summed, against the rail's minimum load (version 2). A regulator that cannot sink current
 * lets its rail rise when more is pushed in than its loads always draw.
 */
import { exceeds } from '../levels/compare.ts';
import { defineRule } from './defineRule.ts';
import { amps } from './format.ts';
import { partsOfPins as partsOf } from '../model/pinKeys.ts';

interface Data {
  rail: string;
  total: number;
  minLoad?: number;
  count: number;
}

export default defineRule({
  id: 'rail-injection',
  meta: {
    title: 'Rails absorb the clamp currents pushed into them',
    severity: {
      error: "when the summed clamp current exceeds the rail's minLoad or the rail states none",
      info: 'when within it',
    },
    explanation:
      'Every clamp current that clamp-current computes (a source driving an input above its viMax through ' +
      "series resistance) flows through the input's protection diode into the input's rail. In each power " +
      "state the currents into one rail are summed and compared with the rail's minLoad, the least current " +
      'its loads always draw: a regulator that cannot sink current lets the rail rise by the excess. A rail ' +
      'that states no minLoad cannot be judged, which is reported as an error rather than passed.',
    hint: "State the rail's minimum load (minLoad), add a bleeder load, or raise the series resistances so less current is injected.",
    messages: {
      exceedsMinLoad: (d: Data) =>
        `${amps(d.total)} of clamp current flows into ${d.rail} through ${d.count} input${d.count === 1 ? '' : 's'}, more than its minimum load of ${amps(d.minLoad ?? 0)}: the rail may rise.`,
      noMinLoad: (d: Data) =>
        `${amps(d.total)} of clamp current flows into ${d.rail} through ${d.count} input${d.count === 1 ? '' : 's'}, and the rail states no minimum load: whether it can absorb it is unknown.`,
      absorbed: (d: Data) =>
        `${amps(d.total)} of clamp current flows into ${d.rail} through ${d.count} input${d.count === 1 ? '' : 's'}, within its minimum load of ${amps(d.minLoad ?? 0)}.`,
    },
  },
  checkInjection(view, report) {
    const { rail, injected } = view;
    let total = 0;
    for (const x of injected) total += x.current;
    if (total === 0) return;
    const pins = injected.map((x) => x.pin);
    const minLoad = rail.minLoad;
    const messageId =
      minLoad === undefined
        ? 'noMinLoad'
        : !Number.isFinite(total) || exceeds(total, minLoad)
          ? 'exceedsMinLoad'
          : 'absorbed';
    report({
      messageId,
      data: {
        rail: view.names.rail(rail.id),
        total,
        count: pins.length,
        ...(minLoad === undefined ? {} : { minLoad }),
      },
      severity: messageId === 'absorbed' ? 'info' : 'error',
      pins,
      parts: partsOf(...pins),
      subject: rail.id,
      values: {
        rail: rail.id,
        total,
        minLoad: minLoad ?? null,
        currents: injected.map((x) => ({ pin: x.pin, net: x.net, current: x.current })),
      },
    });
  },
});
