/**
 * One name for one thing (issue 18): a design whose nets, rails and profiles carry labels that
 * differ from their ids, and a finder of ids in human text where a label belongs. Pin keys
 * (`PART.PIN`) are names people edit by, so an id inside one does not count.
 */
import type { Design } from '../../rules/model/schema.ts';
import { resolveProfile } from '../../rules/profiles/index.ts';

/** Every net, rail and design-local profile labelled with words that contain no id. */
export function relabelled(design: Design): Design {
  return {
    ...design,
    rails: design.rails.map((r, k) => ({ ...r, label: `Supply label ${k + 1}` })),
    ...(design.profiles === undefined
      ? {}
      : { profiles: design.profiles.map((p, k) => ({ ...p, label: `Family label ${k + 1}` })) }),
    nets: design.nets.map((n, k) => ({ ...n, label: `SIGNAL_LABEL_${k + 1}` })),
  };
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/** The ids of nets, rails and profiles (built-in ones included) whose label differs from the id. */
export function labelledIds(design: Design): { kind: string; id: string }[] {
  const out: { kind: string; id: string }[] = [];
  for (const n of design.nets) if (n.label !== undefined && n.label !== n.id) out.push({ kind: 'net', id: n.id });
  for (const r of design.rails) if (r.label !== r.id) out.push({ kind: 'rail', id: r.id });
  const profiles = new Set<string>();
  for (const p of design.parts) {
    profiles.add(p.profile);
    for (const pin of p.pins) if (pin.profile !== undefined) profiles.add(pin.profile);
  }
  for (const p of design.profiles ?? []) profiles.add(p.id);
  for (const id of profiles) {
    const p = resolveProfile(design, id);
    if (p !== undefined && p.label !== id) out.push({ kind: 'profile', id });
  }
  return out;
}

/**
 * The ids of `design` that `text` names where their label belongs, as `net N5` / `rail 3v3`
 * lines. An id counts as a whole token: not inside a longer word, not a part or pin of a
 * `PART.PIN` key.
 */
export function idsWhereLabelsBelong(text: string, design: Design): string[] {
  const found: string[] = [];
  for (const { kind, id } of labelledIds(design)) {
    const token = new RegExp(`(?<![\\w.\\-])${escapeRegExp(id)}(?![\\w\\-]|\\.\\w)`);
    if (token.test(text)) found.push(`${kind} ${id}`);
  }
  return found;
}
