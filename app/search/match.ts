/**
 * The search box's matching: every part, pin, net and finding of a design as an item with the
 * words it is found by (its id and its label; a pin also by `PART.PIN`, a finding also by its
 * message and its rule's title), and a query matched against them, case-insensitive and partial.
 * Hits come grouped by kind, the best first: a word equal to the query, then one starting with
 * it, then one containing it.
 */
import { RULES } from '../../rules/checks/index.ts';
import type { CheckResult, Finding } from '../../rules/engine/index.ts';
import type { Design } from '../../rules/model/index.ts';

export type HitKind = 'part' | 'pin' | 'net' | 'finding';

export const KIND_ORDER: readonly HitKind[] = ['part', 'pin', 'net', 'finding'];
export const KIND_TITLES: Readonly<Record<HitKind, string>> = {
  part: 'Parts',
  pin: 'Pins',
  net: 'Nets',
  finding: 'Findings',
};

/** What choosing an item shows. */
export type SearchTarget =
  | { readonly kind: 'part'; readonly part: string }
  | { readonly kind: 'pin'; readonly part: string; readonly pin: string }
  | { readonly kind: 'net'; readonly net: string }
  | { readonly kind: 'finding'; readonly finding: Finding };

export interface SearchItem {
  readonly kind: HitKind;
  /** Unique among all items: the key of its row. */
  readonly key: string;
  /** What the row shows first. */
  readonly title: string;
  /** What the row shows after it, quieter. */
  readonly detail: string;
  /** The words it is found by. */
  readonly words: readonly string[];
  readonly target: SearchTarget;
}

const TITLES = new Map<string, string>(RULES.map((r) => [r.id, r.meta.title]));

/** Every item of a design and its check, in design order. */
export function searchItems(design: Design, result: CheckResult): SearchItem[] {
  const items: SearchItem[] = [];
  const netOfPin = new Map<string, string>();
  const netLabel = new Map<string, string>();
  for (const n of design.nets) {
    netLabel.set(n.id, n.label ?? n.id);
    for (const p of n.pins) netOfPin.set(p, n.label ?? n.id);
  }
  for (const p of design.parts)
    items.push({
      kind: 'part',
      key: `part:${p.id}`,
      title: p.id,
      detail: p.label,
      words: [p.id, p.label],
      target: { kind: 'part', part: p.id },
    });
  for (const d of design.discretes ?? [])
    items.push({
      kind: 'part',
      key: `part:${d.id}`,
      title: d.id,
      detail: d.label ?? d.kind,
      words: [d.id, d.label ?? d.kind],
      target: { kind: 'part', part: d.id },
    });
  for (const p of design.parts)
    for (const pin of p.pins) {
      const key = `${p.id}.${pin.id}`;
      const net = netOfPin.get(key);
      items.push({
        kind: 'pin',
        key: `pin:${key}`,
        title: key,
        detail: `${p.label} · ${pin.role}${net === undefined ? ' · on no net' : ` · net ${net}`}`,
        words: [key, pin.id],
        target: { kind: 'pin', part: p.id, pin: pin.id },
      });
    }
  for (const n of design.nets)
    items.push({
      kind: 'net',
      key: `net:${n.id}`,
      title: n.label ?? n.id,
      detail: `${n.label !== undefined && n.label !== n.id ? `id ${n.id} · ` : ''}${n.pins.length} pins`,
      words: n.label === undefined ? [n.id] : [n.id, n.label],
      target: { kind: 'net', net: n.id },
    });
  const stateLabel = new Map(result.states.map((s) => [s.id, s.label]));
  for (const f of result.findings) {
    const rule = TITLES.get(f.rule) ?? f.rule;
    items.push({
      kind: 'finding',
      key: `finding:${f.id}`,
      title: f.message,
      // The power state first: the same message often comes in several states.
      detail: `${stateLabel.get(f.scenario) ?? f.scenario} · ${f.severity} · ${rule}`,
      words: [f.id, f.message, rule, ...(f.net === null ? [] : [f.net, netLabel.get(f.net) ?? f.net])],
      target: { kind: 'finding', finding: f },
    });
  }
  return items;
}

/** How well an item's words meet the query: 0 a word equal to it, 1 one starting with it, 2 one containing it; undefined: none. */
export function rank(words: readonly string[], query: string): number | undefined {
  let best: number | undefined;
  for (const w of words) {
    const word = w.toLowerCase();
    const r = word === query ? 0 : word.startsWith(query) ? 1 : word.includes(query) ? 2 : undefined;
    if (r !== undefined && (best === undefined || r < best)) best = r;
  }
  return best;
}

export interface HitGroup {
  readonly kind: HitKind;
  readonly hits: readonly SearchItem[];
  /** Hits of this kind left out beyond the limit. */
  readonly more: number;
}

/**
 * The items matching `query` (trimmed; none for an empty one), grouped by kind in KIND_ORDER,
 * each group best first (ties keep design order) and cut at `perKind`.
 */
export function search(items: readonly SearchItem[], query: string, perKind = 8): HitGroup[] {
  const q = query.trim().toLowerCase();
  if (q === '') return [];
  const ranked = new Map<HitKind, { item: SearchItem; r: number; at: number }[]>();
  items.forEach((item, at) => {
    const r = rank(item.words, q);
    if (r === undefined) return;
    const list = ranked.get(item.kind) ?? [];
    list.push({ item, r, at });
    ranked.set(item.kind, list);
  });
  return KIND_ORDER.flatMap((kind) => {
    const list = ranked.get(kind);
    if (list === undefined) return [];
    list.sort((a, b) => a.r - b.r || a.at - b.at);
    return [{ kind, hits: list.slice(0, perKind).map((x) => x.item), more: Math.max(0, list.length - perKind) }];
  });
}
