/**
 * The parts palette: templates from the profile library, searchable by name and family.
 * Drag one onto the canvas, or press Enter on it (or in the search box for the first match)
 * to place it in the middle of the view.
 */
import { useMemo, useRef, useState, type DragEvent, type KeyboardEvent } from 'react';
import { TEMPLATE_MIME, usePlacePart } from '../canvas/placement.ts';
import { searchTemplates, type Template } from '../store/templates.ts';
import { useEditorStore } from '../store/EditorProvider.tsx';
import { usePlaceDiscrete } from '../canvas/placement.ts';
import type { DiscreteKind } from '../../rules/model/index.ts';

/** The parts between chips, in the trade's words. */
const BETWEEN: readonly { kind: DiscreteKind; name: string; title: string }[] = [
  { kind: 'resistor', name: 'Resistor', title: 'A resistor: in series, or tied to a rail or ground as a pull' },
  {
    kind: 'fet-shifter',
    name: 'FET shifter',
    title: 'A bidirectional N-MOSFET level shifter for open-drain lines: S on the low side, D on the high side',
  },
  {
    kind: 'diode-shifter',
    name: 'Diode shifter',
    title: "A Schottky diode shifter: K on the driver's net, A on the receiver's (with its own pull-up)",
  },
];

function groupByName(list: readonly Template[]): [string, Template[]][] {
  const groups = new Map<string, Template[]>();
  for (const t of list) {
    const g = groups.get(t.name);
    if (g === undefined) groups.set(t.name, [t]);
    else g.push(t);
  }
  return [...groups];
}

export function Palette() {
  const [query, setQuery] = useState('');
  const found = useMemo(() => searchTemplates(query), [query]);
  const groups = useMemo(() => groupByName(found), [found]);
  const place = usePlacePart();
  const placeDiscrete = usePlaceDiscrete();
  const store = useEditorStore();
  const listRef = useRef<HTMLUListElement>(null);

  const items = () => [...(listRef.current?.querySelectorAll<HTMLElement>('[data-template]') ?? [])];
  const move = (from: HTMLElement | null, delta: number) => {
    const all = items();
    const k = from === null ? -1 : all.indexOf(from);
    all[Math.max(0, Math.min(all.length - 1, k + delta))]?.focus();
  };

  const onSearchKey = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'Enter' && found[0] !== undefined) {
      e.preventDefault();
      place(found[0].id);
    } else if (e.key === 'ArrowDown') {
      e.preventDefault();
      move(null, 1);
    }
  };

  const onItemKey = (e: KeyboardEvent<HTMLLIElement>, t: Template) => {
    if (e.key === 'Enter' || e.key === ' ') {
      e.preventDefault();
      place(t.id);
    } else if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      move(e.currentTarget, e.key === 'ArrowDown' ? 1 : -1);
    }
  };

  const onDragStart = (e: DragEvent<HTMLLIElement>, t: Template) => {
    e.dataTransfer.setData(TEMPLATE_MIME, t.id);
    e.dataTransfer.effectAllowed = 'copy';
  };

  return (
    <aside className="rc-palette" aria-label="Parts">
      <div className="rc-palette-top">
        <h2 className="rc-panel-head">Parts</h2>
        <button
          type="button"
          className="rc-new-chip"
          data-testid="new-chip"
          title="Make a chip of your own from a pin table"
          onClick={() => store.getState().openDialog({ kind: 'chip', part: null })}
        >
          New chip…
        </button>
      </div>
      <input
        className="rc-search"
        type="search"
        placeholder="Search name or family"
        aria-label="Search parts"
        value={query}
        onChange={(e) => setQuery(e.target.value)}
        onKeyDown={onSearchKey}
        data-testid="palette-search"
      />
      <ul className="rc-palette-list" ref={listRef} aria-label="Part templates">
        {groups.map(([name, list]) => (
          <li key={name} className="rc-palette-group">
            <div className="rc-palette-name">{name}</div>
            <ul>
              {list.map((t) => (
                <li
                  key={t.id}
                  className="rc-template"
                  // biome-ignore lint/a11y/noNoninteractiveTabindex: a palette entry is picked with Enter (places the part) as well as dragged
                  tabIndex={0}
                  draggable
                  data-template={t.id}
                  title={`${t.name}: ${t.family}. Drag onto the canvas, or press Enter.`}
                  onKeyDown={(e) => onItemKey(e, t)}
                  onDragStart={(e) => onDragStart(e, t)}
                  onDoubleClick={() => place(t.id)}
                >
                  {t.family}
                </li>
              ))}
            </ul>
          </li>
        ))}
        {found.length === 0 && <li className="rc-empty">No part matches “{query}”.</li>}
      </ul>
      {/* biome-ignore lint/a11y/useSemanticElements: a group of buttons, not a form */}
      <div className="rc-palette-between" role="group" aria-label="Between chips">
        <h3>Between chips</h3>
        {BETWEEN.map((b) => (
          <button
            key={b.kind}
            type="button"
            className="rc-new-chip"
            data-testid={`place-${b.kind}`}
            title={b.title}
            onClick={() => placeDiscrete(b.kind)}
          >
            {b.name}
          </button>
        ))}
      </div>
      <div className="rc-palette-foot">Drag a part onto the canvas, or select it and press Enter.</div>
    </aside>
  );
}
