/**
 * The search box ("/" or Ctrl+K): type part of an id or a name, see the parts, pins, nets and
 * findings it matches grouped by kind, choose one with the arrows and Enter (or a click). The
 * choice is selected (its details open in the side panel) and brought into view on the canvas.
 */
import { useCallback, useId, useMemo, useState, type KeyboardEvent } from 'react';
import { useReactFlow } from '@xyflow/react';
import { chipBox } from '../canvas/routes.ts';
import { useFocus } from '../canvas/placement.ts';
import { Modal } from '../panels/Modal.tsx';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { KIND_TITLES, search, searchItems, type SearchItem, type SearchTarget } from './match.ts';

/** Choosing an item: select it and bring it into view. */
function useReveal(): (target: SearchTarget) => void {
  const store = useEditorStore();
  const focus = useFocus();
  const { setCenter, getZoom } = useReactFlow();
  return useCallback(
    (target) => {
      const s = store.getState();
      switch (target.kind) {
        case 'part': {
          s.select({ parts: [target.part], wires: [], net: null });
          focus({ part: target.part });
          return;
        }
        case 'pin': {
          s.select({ parts: [target.part], wires: [], net: null });
          const part = s.design.parts.find((p) => p.id === target.part);
          const anchor = part && chipBox(part).pins.find((a) => a.key === `${target.part}.${target.pin}`);
          if (anchor === undefined) focus({ part: target.part });
          else void setCenter(anchor.x, anchor.y, { zoom: Math.max(getZoom(), 1), duration: 250 });
          return;
        }
        case 'net': {
          s.select({ parts: [], wires: [], net: target.net });
          focus({ net: target.net });
          return;
        }
        case 'finding': {
          // The wires take the colours of the finding's power state, as the findings list shows it.
          const f = target.finding;
          s.setPowerState(f.scenario);
          if (f.net !== null) {
            s.select({ parts: [], wires: [], net: f.net });
            focus({ net: f.net });
          } else if (f.parts[0] !== undefined) {
            s.select({ parts: [f.parts[0]], wires: [], net: null });
            focus({ part: f.parts[0] });
          }
          return;
        }
      }
    },
    [store, focus, setCenter, getZoom],
  );
}

export function SearchDialog() {
  const store = useEditorStore();
  const design = useEditor((s) => s.design);
  const result = useEditor((s) => s.result);
  const reveal = useReveal();
  const listId = useId();
  const [query, setQuery] = useState('');
  const [active, setActive] = useState(0);
  const items = useMemo(() => searchItems(design, result), [design, result]);
  const groups = useMemo(() => search(items, query), [items, query]);
  const flat = useMemo(() => groups.flatMap((g) => g.hits), [groups]);
  const at = Math.min(active, flat.length - 1);
  const optionId = (k: number) => `${listId}-${k}`;
  const close = () => store.getState().openDialog(null);
  const choose = (item: SearchItem | undefined) => {
    if (item === undefined) return;
    close();
    reveal(item.target);
  };
  const onKey = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      if (flat.length > 0) setActive((at + (e.key === 'ArrowDown' ? 1 : flat.length - 1)) % flat.length);
    } else if (e.key === 'Enter') {
      e.preventDefault();
      choose(flat[at]);
    }
  };

  let k = 0;
  return (
    <Modal title="Find" onClose={close} testId="search">
      <input
        type="text"
        className="rc-search-input"
        role="combobox"
        aria-label="Find a part, pin, net or finding"
        aria-expanded={flat.length > 0}
        aria-controls={listId}
        aria-activedescendant={flat.length > 0 ? optionId(at) : undefined}
        aria-autocomplete="list"
        placeholder="Part, pin, net or finding: its id or name"
        data-autofocus
        data-testid="search-input"
        value={query}
        onChange={(e) => {
          setQuery(e.target.value);
          setActive(0);
        }}
        onKeyDown={onKey}
      />
      {query.trim() !== '' && flat.length === 0 && (
        <p className="rc-muted" role="status">
          No part, pin, net or finding matches “{query.trim()}”.
        </p>
      )}
      <div id={listId} role="listbox" aria-label="Matches" className="rc-search-list">
        {groups.map((g) => (
          // biome-ignore lint/a11y/useSemanticElements: a group of options inside a listbox (ARIA's pattern); a fieldset groups form fields
          <div key={g.kind} role="group" aria-label={KIND_TITLES[g.kind]} className="rc-search-group">
            <h3 className="rc-search-kind">{KIND_TITLES[g.kind]}</h3>
            {g.hits.map((hit) => {
              const index = k++;
              return (
                // biome-ignore lint/a11y/useKeyWithClickEvents: the options' keys are the search field's (a combobox): arrows move, Enter chooses
                <div
                  key={hit.key}
                  id={optionId(index)}
                  role="option"
                  tabIndex={-1}
                  aria-selected={index === at}
                  className={`rc-search-hit${index === at ? ' rc-search-hit--active' : ''}`}
                  data-search-hit={hit.key}
                  onMouseMove={() => index !== at && setActive(index)}
                  onClick={() => choose(hit)}
                >
                  <span className="rc-search-title">{hit.title}</span>
                  <span className="rc-search-detail">{hit.detail}</span>
                </div>
              );
            })}
            {g.more > 0 && (
              <p className="rc-search-more">
                and {g.more} more {KIND_TITLES[g.kind].toLowerCase()}: type more of the name
              </p>
            )}
          </div>
        ))}
      </div>
    </Modal>
  );
}
