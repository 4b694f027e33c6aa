/**
 * The findings: grouped by severity then rule (in the catalogue's order), filtered by power
 * state, rule and severity. A click selects the finding's net (or part) and brings it into view.
 */
import { useCallback, useMemo, useState, type ReactNode } from 'react';
import type { Finding, Severity } from '../../rules/engine/index.ts';
import { RULES } from '../../rules/checks/index.ts';
import { SeverityGlyph } from '../canvas/SeverityGlyph.tsx';
import { useFocus } from '../canvas/placement.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { CrossingsTable } from './CrossingsTable.tsx';
import { FindingRow } from './FindingRow.tsx';

const SEVERITIES: readonly { key: Severity; title: string }[] = [
  { key: 'error', title: 'Errors' },
  { key: 'warning', title: 'Warnings' },
  { key: 'info', title: 'Information' },
];

const TITLES = new Map<string, string>(RULES.map((r) => [r.id, r.meta.title]));
/**
 * Rows listed per rule before a "show more" button: a large design can have thousands of
 * findings of one rule, and every listed row is DOM that an edit may have to re-render.
 */
export const ROWS_SHOWN = 60;
const MORE_ROWS = 200;
const CANVAS = '(canvas)';
const ALL = '(all)';

function place(f: Finding, netLabel: (id: string) => string): string {
  if (f.net !== null) return netLabel(f.net);
  if (f.pins.length > 0) return f.pins.join(', ');
  return f.id.split(':')[1] ?? '';
}

/** One rule's findings: the first `ROWS_SHOWN`, then as many more as asked for. */
function RuleRows({ rule, rows, row }: { rule: string; rows: readonly Finding[]; row: (f: Finding) => ReactNode }) {
  const [limit, setLimit] = useState(ROWS_SHOWN);
  const hidden = rows.length - limit;
  return (
    <div className="rc-rule-group">
      <h4>
        {TITLES.get(rule) ?? rule} <span className="rc-n">{rows.length}</span>
      </h4>
      <ul>{(hidden > 0 ? rows.slice(0, limit) : rows).map(row)}</ul>
      {hidden > 0 && (
        <button
          type="button"
          className="rc-more"
          data-testid={`more-${rule}`}
          onClick={() => setLimit(limit + MORE_ROWS)}
        >
          {hidden <= MORE_ROWS ? `Show the other ${hidden}` : `Show ${MORE_ROWS} more (${hidden} not listed)`}
        </button>
      )}
    </div>
  );
}

export function FindingsPanel() {
  const store = useEditorStore();
  const findings = useEditor((s) => s.result.findings);
  const states = useEditor((s) => s.result.states);
  const powerState = useEditor((s) => s.powerState);
  const nets = useEditor((s) => s.design.nets);
  const focus = useFocus();
  const [stateFilter, setStateFilter] = useState(CANVAS);
  const [ruleFilter, setRuleFilter] = useState(ALL);
  const [shown, setShown] = useState<Record<Severity | 'waived', boolean>>({
    error: true,
    warning: true,
    info: false,
    waived: true,
  });
  const [view, setView] = useState<'findings' | 'crossings'>('findings');

  const scenario = stateFilter === CANVAS ? powerState : stateFilter;
  const stateLabel = useMemo(() => new Map(states.map((s) => [s.id, s.label])), [states]);
  const netLabel = useMemo(() => {
    const m = new Map(nets.map((n) => [n.id, n.label ?? n.id]));
    return (id: string) => m.get(id) ?? id;
  }, [nets]);

  const inState = useMemo(
    () => findings.filter((f) => scenario === ALL || f.scenario === scenario),
    [findings, scenario],
  );
  const counts = useMemo(() => {
    const c = { error: 0, warning: 0, info: 0, waived: 0 };
    for (const f of inState) c[f.waived !== undefined ? 'waived' : f.severity]++;
    return c;
  }, [inState]);
  const groups = useMemo(() => {
    const visible = inState.filter(
      (f) =>
        (ruleFilter === ALL || f.rule === ruleFilter) && (f.waived !== undefined ? shown.waived : shown[f.severity]),
    );
    return SEVERITIES.map(({ key, title }) => {
      const rows = visible.filter((f) => f.severity === key);
      const rules = RULES.map((r) => ({ rule: r.id, rows: rows.filter((f) => f.rule === r.id) })).filter(
        (g) => g.rows.length > 0,
      );
      return { key, title, rules, size: rows.length, waived: rows.filter((f) => f.waived !== undefined).length };
    }).filter((g) => g.size > 0);
  }, [inState, ruleFilter, shown]);

  const pick = useCallback(
    (f: Finding) => {
      const s = store.getState();
      if (f.net !== null) {
        s.select({ parts: [], wires: [], net: f.net });
        focus({ net: f.net });
      } else if (f.parts[0] !== undefined) {
        s.select({ parts: [f.parts[0]], wires: [], net: null });
        focus({ part: f.parts[0] });
      }
    },
    [store, focus],
  );

  return (
    <section className="rc-findings" aria-label="Findings">
      <div className="rc-panel-tabs" role="tablist" aria-label="Findings or rail crossings">
        <h2 className="rc-panel-head">
          <button
            type="button"
            role="tab"
            aria-selected={view === 'findings'}
            className={view === 'findings' ? 'rc-tab rc-tab--on' : 'rc-tab'}
            onClick={() => setView('findings')}
            data-testid="tab-findings"
          >
            Findings
          </button>
        </h2>
        <button
          type="button"
          role="tab"
          aria-selected={view === 'crossings'}
          className={view === 'crossings' ? 'rc-tab rc-tab--on' : 'rc-tab'}
          onClick={() => setView('crossings')}
          data-testid="tab-crossings"
        >
          Rail crossings
        </button>
      </div>
      {view === 'crossings' ? (
        <div className="rc-findings-list">
          <CrossingsTable />
        </div>
      ) : (
        <>
          <div className="rc-filters">
            <select
              aria-label="Power state of the findings"
              value={stateFilter}
              onChange={(e) => setStateFilter(e.target.value)}
              data-testid="findings-state"
            >
              <option value={CANVAS}>As on the canvas</option>
              <option value={ALL}>All power states</option>
              {states.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.label}
                </option>
              ))}
            </select>
            <select
              aria-label="Rule"
              value={ruleFilter}
              onChange={(e) => setRuleFilter(e.target.value)}
              data-testid="findings-rule"
            >
              <option value={ALL}>All rules</option>
              {RULES.map((r) => (
                <option key={r.id} value={r.id}>
                  {r.meta.title}
                </option>
              ))}
            </select>
            <div className="rc-toggles">
              {(['error', 'warning', 'info', 'waived'] as const).map((k) => (
                <label key={k} className={`rc-toggle rc-toggle--${k}`}>
                  <input
                    type="checkbox"
                    checked={shown[k]}
                    onChange={(e) => setShown({ ...shown, [k]: e.target.checked })}
                    data-testid={`show-${k}`}
                  />
                  {k} ({counts[k]})
                </label>
              ))}
            </div>
          </div>
          <div className="rc-findings-list">
            {groups.length === 0 && <p className="rc-empty">Nothing to show with these filters.</p>}
            {groups.map((g) => (
              <section key={g.key} className={`rc-sev-group rc-sev-group--${g.key}`}>
                <h3>
                  <SeverityGlyph severity={g.key} /> {g.title}{' '}
                  <span className="rc-n">
                    {g.size}
                    {g.waived > 0 && `, ${g.waived} waived`}
                  </span>
                </h3>
                {g.rules.map(({ rule, rows }) => (
                  <RuleRows
                    key={rule}
                    rule={rule}
                    rows={rows}
                    row={(f) => (
                      <FindingRow
                        key={f.id}
                        finding={f}
                        showState={scenario === ALL}
                        onPick={pick}
                        text={{
                          place: place(f, netLabel),
                          rule: TITLES.get(f.rule) ?? f.rule,
                          state: stateLabel.get(f.scenario) ?? f.scenario,
                        }}
                      />
                    )}
                  />
                ))}
              </section>
            ))}
          </div>
        </>
      )}
    </section>
  );
}
