/**
 * Every net that crosses rails, one row per power state, with both worst margins: sortable by
 * any column. A click selects the net in that power state, which opens its voltage ladder in
 * the details panel. The table fits the panel at its default width; narrower, it scrolls inside
 * a frame of its own, never beyond the panel.
 */
import { useMemo, useState } from 'react';
import { crossingRows } from '../../rules/report/index.ts';
import type { Crossing } from '../../rules/report/index.ts';
import { formatMargin } from '../../rules/levels/index.ts';
import { labelOr } from '../../rules/engine/index.ts';
import { useFocus } from '../canvas/placement.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import './explain.css';

type Column = 'net' | 'rails' | 'scenario' | 'marginHigh' | 'marginLow' | 'worst';

const COLUMNS: readonly { key: Column; title: string }[] = [
  { key: 'net', title: 'Net and rails' },
  { key: 'scenario', title: 'State' },
  { key: 'marginHigh', title: 'NMH' },
  { key: 'marginLow', title: 'NML' },
  { key: 'worst', title: 'Worst' },
];

const WORST_RANK: Record<Crossing['worst'], number> = { error: 0, warning: 1, ok: 2 };

function sortValue(row: Crossing, key: Column): number | string {
  switch (key) {
    case 'marginHigh':
    case 'marginLow':
      // No pair sorts last whichever way: a missing margin is not a good one.
      return row[key] ?? Number.POSITIVE_INFINITY;
    case 'worst':
      return WORST_RANK[row.worst];
    case 'rails':
      return row.rails.join(' ');
    case 'net':
      return row.label;
    default:
      return row[key];
  }
}

const margin = (m: number | null) => (m === null ? '—' : formatMargin(m));

export function CrossingsTable() {
  const store = useEditorStore();
  const result = useEditor((s) => s.result);
  const focus = useFocus();
  const [sort, setSort] = useState<{ key: Column; up: boolean }>({ key: 'marginHigh', up: true });
  const railList = useEditor((s) => s.design.rails);
  // Rails by the labels the editor shows everywhere else (one name for one thing).
  const railName = useMemo(() => {
    const labels = new Map(railList.map((r) => [r.id, labelOr(r.label, r.id)]));
    return (id: string) => labels.get(id) ?? id;
  }, [railList]);
  const rows = useMemo(() => {
    const all = crossingRows(result);
    const dir = sort.up ? 1 : -1;
    return all.sort((a, b) => {
      const x = sortValue(a, sort.key);
      const y = sortValue(b, sort.key);
      return (x < y ? -1 : x > y ? 1 : 0) * dir;
    });
  }, [result, sort]);
  const open = (row: Crossing) => {
    const s = store.getState();
    s.setPowerState(row.scenario);
    s.select({ parts: [], wires: [], net: row.net });
    focus({ net: row.net });
  };
  if (rows.length === 0) return <p className="rc-empty">No net crosses rails.</p>;
  return (
    <>
      <p className="rc-muted rc-tight">
        Worst high (NMH) and low (NML) noise margins of every net that joins pins of different rails, per power state.
        Click a row for its voltage ladder.
      </p>
      <div className="rc-table-frame" data-testid="crossings-frame">
        <table className="rc-crossings" data-testid="crossings">
          <thead>
            <tr>
              {COLUMNS.map((c) => (
                <th
                  key={c.key}
                  scope="col"
                  aria-sort={sort.key === c.key ? (sort.up ? 'ascending' : 'descending') : 'none'}
                >
                  <button
                    type="button"
                    className="rc-link"
                    onClick={() => setSort({ key: c.key, up: sort.key === c.key ? !sort.up : true })}
                  >
                    {c.title}
                    {sort.key === c.key ? (sort.up ? ' ▲' : ' ▼') : ''}
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr
                key={`${r.scenario}:${r.net}`}
                data-net={r.net}
                data-severity={r.worst}
                data-scenario={r.scenario}
                tabIndex={0}
                onClick={() => open(r)}
                onKeyDown={(e) => {
                  if (e.key === 'Enter') open(r);
                }}
              >
                <td data-rails={r.rails.join(' ')}>
                  <span className="rc-crossing-net">{r.label}</span>
                  {r.rails.map((id) => (
                    <span key={id} className="rc-rail-name" title={railName(id)}>
                      {railName(id)}
                    </span>
                  ))}
                </td>
                <td>{r.scenario}</td>
                <td className="rc-num" data-margin={r.marginHigh ?? ''}>
                  {margin(r.marginHigh)}
                </td>
                <td className="rc-num" data-margin={r.marginLow ?? ''}>
                  {margin(r.marginLow)}
                </td>
                <td className={`rc-worst rc-worst--${r.worst}`}>{r.worst}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
