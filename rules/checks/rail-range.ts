/**
 * rail-range: a rail whose range leaves the supply range over which a profile's numbers hold,
 * one finding per (rail, profile); runs once, in `all-on` (rules-catalogue.md).
 */
import { below, exceeds } from '../levels/compare.ts';
import { defineRule } from './defineRule.ts';
import { volts } from './format.ts';

interface Data {
  rail: string;
  profile: string;
  railMin: number;
  railMax: number;
  profileMin: number;
  profileMax: number;
  count: number;
}

export default defineRule({
  id: 'rail-range',
  meta: {
    title: "Rails stay inside the families' supply ranges",
    severity: { warning: '' },
    explanation:
      "A profile's levels hold only over its vddRange. Each rail is compared with the narrowest " +
      "vddRange of the pins on it that use one profile; outside it, the profile's numbers are not " +
      'guaranteed and every margin on those pins is in doubt.',
    hint:
      "Bring the rail inside the family's range, or take the chosen part's datasheet values for " +
      'this supply into a design-local profile.',
    messages: {
      outside: (d: Data) =>
        `Rail ${d.rail} spans ${volts(d.railMin)}–${volts(d.railMax)}, outside the ${volts(d.profileMin)}–${volts(d.profileMax)} ` +
        `over which ${d.profile} holds (${d.count} pin${d.count === 1 ? '' : 's'}).`,
    },
  },
  checkRail(view, report) {
    const { rail, range, profile } = view;
    if (view.vddRanges.length === 0) return;
    let profileMin = -Infinity;
    let profileMax = Infinity;
    for (const [lo, hi] of view.vddRanges) {
      profileMin = Math.max(profileMin, lo);
      profileMax = Math.min(profileMax, hi);
    }
    if (!below(range.min, profileMin) && !exceeds(range.max, profileMax)) return;
    const keys = view.pinKeys();
    report({
      messageId: 'outside',
      data: {
        rail: view.names.rail(rail.id),
        profile: view.names.profile(profile),
        railMin: range.min,
        railMax: range.max,
        profileMin,
        profileMax,
        count: keys.length,
      },
      severity: 'warning',
      pins: keys,
      parts: view.partIds(),
      subject: rail.id,
      suffix: profile,
      values: { rail: rail.id, railMin: range.min, railMax: range.max, profileMin, profileMax, profile },
    });
  },
});
