/**
 * The pins of a (rail, profile) group that have a `vddRange`, sorted, with their distinct parts:
 * what a `rail-range` finding lists. A rail outside its family's range makes that finding name
 * every pin of the family (thousands on a large board), and every edit that touches one of them
 * judges the group again; sorting the group on each of those edits cost about a millisecond at
 * 10,000 parts. So the lists are made once, when first asked for, and then kept in order pin by
 * pin (a binary search and one splice per pin that joins or leaves).
 *
 * Part and pin ids hold no "." (the format refuses it), so the keys `PART.PIN` of one part sit
 * together in the sorted keys, and the parts in order of first appearance are the part ids in
 * the order of `PART.`.
 */
import { partOfPin } from '../model/pinKeys.ts';

export class RangedPins {
  private readonly keyList: string[] = [];
  private readonly partList: string[] = [];
  /** Pins per part, to know when a part's last pin leaves. */
  private readonly perPart = new Map<string, number>();

  /** The lists for these keys (any order). */
  static of(keys: Iterable<string>): RangedPins {
    const made = new RangedPins();
    const sorted = [...keys].sort();
    made.keyList.push(...sorted);
    for (const key of sorted) {
      const part = partOfPin(key);
      const n = made.perPart.get(part) ?? 0;
      if (n === 0) made.partList.push(part);
      made.perPart.set(part, n + 1);
    }
    return made;
  }

  add(key: string): void {
    const at = lowerBound(this.keyList, key, byString);
    if (this.keyList[at] === key) return;
    this.keyList.splice(at, 0, key);
    const part = partOfPin(key);
    const n = this.perPart.get(part) ?? 0;
    this.perPart.set(part, n + 1);
    if (n === 0) this.partList.splice(lowerBound(this.partList, part, byPartPrefix), 0, part);
  }

  delete(key: string): void {
    const at = lowerBound(this.keyList, key, byString);
    if (this.keyList[at] !== key) return;
    this.keyList.splice(at, 1);
    const part = partOfPin(key);
    const n = this.perPart.get(part) ?? 0;
    if (n > 1) {
      this.perPart.set(part, n - 1);
      return;
    }
    this.perPart.delete(part);
    const p = lowerBound(this.partList, part, byPartPrefix);
    if (this.partList[p] === part) this.partList.splice(p, 1);
  }

  /** The sorted keys, as a new array (a finding keeps it). */
  keys(): string[] {
    return this.keyList.slice();
  }

  /** The distinct parts in order of first appearance among the sorted keys, as a new array. */
  parts(): string[] {
    return this.partList.slice();
  }
}

/** The order of `Array.prototype.sort` without a comparator: UTF-16 code units. */
const byString = (a: string, b: string): boolean => a < b;
/** The order in which a part's keys `PART.PIN` come in the sorted keys. */
const byPartPrefix = (a: string, b: string): boolean => `${a}.` < `${b}.`;

/** The first index whose element is not before `x`. */
function lowerBound(list: readonly string[], x: string, before: (a: string, b: string) => boolean): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (before(list[mid]!, x)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
