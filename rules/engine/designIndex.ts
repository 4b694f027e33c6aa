/**
 * The engine's indexes over a design: pin → location, resolved rail, profile and vddRange; pin
 * → net; part and net by id; (rail, profile) groups with their counted vddRanges. Built once by
 * a full check, then updated by the difference, so that no step of an incremental check is
 * quadratic in the design's size. What only a rail or profile edit needs is scanned then.
 */
import type { Design, Discrete, Net, Part, Pin } from '../model/schema.ts';
import { DISCRETE_PINS } from '../model/schema.ts';
import { makeResolved, type Resolution } from './resolve.ts';
import { RangedPins } from './rangedPins.ts';

/**
 * What the index remembers of a pin, to take it out again when the pin changes. It is the pin's
 * `Resolution` too (its effective parameters, re-made whenever the pin, its part or its profile
 * changes): one object per pin besides the resolved pin itself, since every object the index
 * keeps is one more for the garbage collector to copy while a large board is read.
 */
export interface PinEntry extends Resolution {
  readonly part: Part;
  readonly pin: Pin;
  readonly rail: string;
  readonly profile: string;
  readonly pullTo: string | undefined;
  /** The resolved `vddRange`, kept so that a group's ranges are counted without resolving again. */
  readonly vddRange: readonly [number, number] | undefined;
}

/** A (rail, profile) group: its pins, and how many of them hold each distinct `vddRange`. */
export interface PinGroup {
  readonly pins: Set<string>;
  /** Keyed by the range object itself: pins of one family share their profile's array. */
  readonly ranges: Map<readonly [number, number], { range: readonly [number, number]; count: number }>;
  /** The pins with a `vddRange`, sorted: made when a rule first asks (`rangedPins`), then kept. */
  ranged?: RangedPins;
}

function addTo(map: Map<string, Set<string>>, key: string, value: string): void {
  let set = map.get(key);
  if (set === undefined) {
    set = new Set();
    map.set(key, set);
  }
  set.add(value);
}

function removeFrom(map: Map<string, Set<string>>, key: string, value: string): void {
  const set = map.get(key);
  if (set === undefined) return;
  set.delete(value);
  if (set.size === 0) map.delete(key);
}

/** The key of a (rail, profile) group: `rail-range` judges each group once. */
export function groupKey(rail: string, profile: string): string {
  return `${rail}\u0000${profile}`;
}

/** The rail and profile of a group key. */
export function splitGroupKey(key: string): [string, string] {
  const k = key.indexOf('\u0000');
  return [key.slice(0, k), key.slice(k + 1)];
}

export class DesignIndex {
  /** `PART.PIN` → where it lives. */
  readonly pins = new Map<string, PinEntry>();
  /** Part id → part (the current object). */
  readonly parts = new Map<string, Part>();
  /** Net id → net (the current object). */
  readonly nets = new Map<string, Net>();
  /** `PART.PIN` → the id of the net it is on. */
  readonly netOfPin = new Map<string, string>();
  /** Keys of the pins that are on no net (few on a real board: walked instead of every pin). */
  readonly lone = new Set<string>();
  /** (rail, profile) group key → its pins and the distinct vddRanges among them. */
  readonly groups = new Map<string, PinGroup>();
  /** Rail id → the (rail, profile) group keys on it. */
  readonly groupsOfRail = new Map<string, Set<string>>();
  /** Discrete part id → the part (version 2: resistors, FET and diode shifters). */
  readonly discretes = new Map<string, Discrete>();
  /** Net id → the ids of the discretes with a pin on it. */
  readonly linksOfNet = new Map<string, Set<string>>();

  private lastGroup: { rail: string; profile: string; key: string } | undefined;

  /** An index of every part and net. */
  static build(design: Design): DesignIndex {
    const index = new DesignIndex();
    // Nets first: a pin added after its net is known is never put among the lone pins only to be
    // taken out again (on a board nearly every pin is on a net).
    for (const net of design.nets) index.addNet(net);
    for (const part of design.parts) index.addPart(design, part);
    for (const d of design.discretes ?? []) index.addDiscrete(d);
    return index;
  }

  addDiscrete(d: Discrete): void {
    this.discretes.set(d.id, d);
    for (const pin of DISCRETE_PINS[d.kind]) {
      const n = this.netOfPin.get(`${d.id}.${pin}`);
      if (n !== undefined) addTo(this.linksOfNet, n, d.id);
    }
  }

  removeDiscrete(d: Discrete): void {
    if (this.discretes.get(d.id) === d) this.discretes.delete(d.id);
    for (const pin of DISCRETE_PINS[d.kind]) {
      const n = this.netOfPin.get(`${d.id}.${pin}`);
      if (n !== undefined) removeFrom(this.linksOfNet, n, d.id);
    }
  }

  /** The nets of a discrete's pins, by pin (undefined for a pin on no net). */
  netsOfDiscrete(d: Discrete): (string | undefined)[] {
    return DISCRETE_PINS[d.kind].map((pin) => this.netOfPin.get(`${d.id}.${pin}`));
  }

  /** Every net joined to `netId` through discrete parts, itself included (breadth first). */
  componentOf(netId: string, into: Set<string> = new Set()): Set<string> {
    if (into.has(netId)) return into;
    into.add(netId);
    const queue = [netId];
    while (queue.length > 0) {
      const n = queue.pop()!;
      for (const id of this.linksOfNet.get(n) ?? []) {
        const d = this.discretes.get(id);
        if (d === undefined) continue;
        for (const other of this.netsOfDiscrete(d)) {
          if (other !== undefined && !into.has(other)) {
            into.add(other);
            queue.push(other);
          }
        }
      }
    }
    return into;
  }

  addPart(design: Design, part: Part): void {
    this.parts.set(part.id, part);
    for (const pin of part.pins) this.addPin(design, part, pin);
  }

  /** The group's pins that have a `vddRange`, sorted, with their parts (made on first use). */
  rangedPins(group: PinGroup): RangedPins {
    group.ranged ??= RangedPins.of([...group.pins].filter((k) => this.pins.get(k)?.vddRange !== undefined));
    return group.ranged;
  }

  /** Takes a pin out and puts it back as it is now (its part, pin or profile changed). */
  refreshPin(design: Design, key: string): void {
    const entry = this.pins.get(key);
    if (entry === undefined) return;
    const part = this.parts.get(entry.part.id);
    const pin = part?.pins.find((p) => `${part.id}.${p.id}` === key);
    this.removePin(key);
    if (part !== undefined && pin !== undefined) this.addPin(design, part, pin);
  }

  removePart(part: Part): void {
    if (this.parts.get(part.id) === part) this.parts.delete(part.id);
    for (const pin of part.pins) this.removePin(`${part.id}.${pin.id}`);
  }

  addPin(design: Design, part: Part, pin: Pin): void {
    const resolved = makeResolved(design, part, pin);
    const key = resolved.key;
    const vddRange = resolved.params.vddRange;
    const entry: PinEntry = {
      resolved,
      unpowered: undefined,
      part,
      pin,
      rail: resolved.rail,
      profile: resolved.profileId,
      pullTo: pin.pull?.to,
      vddRange,
    };
    this.pins.set(key, entry);
    if (!this.netOfPin.has(key)) this.lone.add(key);
    // Pins of one part nearly always share its rail and profile: reuse the last group's key.
    const last = this.lastGroup;
    const gk =
      last !== undefined && last.rail === entry.rail && last.profile === entry.profile
        ? last.key
        : groupKey(entry.rail, entry.profile);
    if (last === undefined || last.key !== gk) this.lastGroup = { rail: entry.rail, profile: entry.profile, key: gk };
    let group = this.groups.get(gk);
    if (group === undefined) {
      group = { pins: new Set(), ranges: new Map() };
      this.groups.set(gk, group);
      addTo(this.groupsOfRail, entry.rail, gk);
    }
    group.pins.add(key);
    if (vddRange !== undefined) {
      group.ranged?.add(key);
      const slot = group.ranges.get(vddRange);
      if (slot === undefined) group.ranges.set(vddRange, { range: vddRange, count: 1 });
      else slot.count++;
    }
  }

  removePin(key: string): void {
    const entry = this.pins.get(key);
    if (entry === undefined) return;
    this.pins.delete(key);
    this.lone.delete(key);
    const gk = groupKey(entry.rail, entry.profile);
    const group = this.groups.get(gk);
    if (group !== undefined) {
      group.pins.delete(key);
      if (entry.vddRange !== undefined) {
        group.ranged?.delete(key);
        const slot = group.ranges.get(entry.vddRange);
        if (slot !== undefined && --slot.count === 0) group.ranges.delete(entry.vddRange);
      }
      if (group.pins.size === 0) {
        this.groups.delete(gk);
        removeFrom(this.groupsOfRail, entry.rail, gk);
      }
    }
  }

  /** Points an unchanged pin at its part's new object (a part that moved or was relabelled). */
  retargetPart(part: Part): void {
    this.parts.set(part.id, part);
    for (const pin of part.pins) {
      const key = `${part.id}.${pin.id}`;
      const entry = this.pins.get(key);
      if (entry !== undefined) this.pins.set(key, { ...entry, part });
    }
  }

  addNet(net: Net): void {
    this.nets.set(net.id, net);
    for (const key of net.pins) {
      this.netOfPin.set(key, net.id);
      // While the index is built the nets come first, so no pin is lone yet: skip the lookup.
      if (this.lone.size > 0) this.lone.delete(key);
      if (this.discretes.size > 0) {
        const id = key.slice(0, key.indexOf('.'));
        if (this.discretes.has(id)) addTo(this.linksOfNet, net.id, id);
      }
    }
  }

  removeNet(net: Net): void {
    if (this.nets.get(net.id) === net) this.nets.delete(net.id);
    for (const key of net.pins) {
      if (this.netOfPin.get(key) !== net.id) continue;
      this.netOfPin.delete(key);
      if (this.pins.has(key)) this.lone.add(key);
    }
    this.linksOfNet.delete(net.id);
  }

  /**
   * What depends on a rail: the nets of pins on it or pulled to it, and the pins on it. A rail
   * edit reaches a large share of the design anyway, so this scans rather than keeping sets
   * that every pin would pay for.
   */
  touchingRail(rail: string, nets: Set<string>, pins: Set<string>): void {
    for (const [key, entry] of this.pins) {
      if (entry.rail === rail) pins.add(key);
      if (entry.rail !== rail && entry.pullTo !== rail) continue;
      const n = this.netOfPin.get(key);
      if (n !== undefined) nets.add(n);
    }
    for (const net of this.nets.values()) if (net.pull?.to === rail) nets.add(net.id);
    // A resistor tied to the rail, a FET shifter's gate on it.
    for (const d of this.discretes.values()) {
      const on =
        d.kind === 'resistor'
          ? d.tie?.['1'] === rail || d.tie?.['2'] === rail
          : d.kind === 'fet-shifter' && d.gate === rail;
      if (!on) continue;
      for (const n of this.netsOfDiscrete(d)) if (n !== undefined) nets.add(n);
    }
  }

  /** Keys of the pins whose effective profile id is this (scanned: design-local profiles change rarely). */
  pinsUsingProfile(profile: string): string[] {
    const out: string[] = [];
    for (const [key, entry] of this.pins) if (entry.profile === profile) out.push(key);
    return out;
  }
}
