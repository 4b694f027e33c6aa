/**
 * The start page: the example design, read by the design reader and checked by the rule
 * engine in the browser, with its findings grouped by severity, the rail crossings and the
 * report's cautions. A placeholder for the editor, built on the real engine and report.
 */
import example from '../rules/examples/greenhouse.json';
import { check } from '../rules/engine/check.ts';
import { formatQuantity } from '../rules/levels/units.ts';
import { validateDesign } from '../rules/model/reader.ts';
import { buildReport } from '../rules/report/buildReport.ts';
import type { Report, ReportFinding } from '../rules/report/reportSchema.ts';
import { verdict } from '../rules/report/verdict.ts';

type Loaded = { ok: true; report: Report; ms: number } | { ok: false; errors: string[] };

/** Reads and checks the example once, when the module loads: it never changes. */
function load(): Loaded {
  const read = validateDesign(example);
  if (!read.ok) return { ok: false, errors: read.errors.map((e) => `${e.path}: ${e.message}`) };
  const result = check(read.design);
  const report = buildReport(read.design, result, { failOn: 'error', generatedAt: new Date().toISOString() });
  return { ok: true, report, ms: result.stats.ms };
}

const loaded = load();

const GROUPS: readonly { key: string; title: string; pick: (f: ReportFinding) => boolean }[] = [
  { key: 'error', title: 'Errors', pick: (f) => f.waived === undefined && f.severity === 'error' },
  { key: 'warning', title: 'Warnings', pick: (f) => f.waived === undefined && f.severity === 'warning' },
  { key: 'info', title: 'Information', pick: (f) => f.waived === undefined && f.severity === 'info' },
  { key: 'waived', title: 'Waived', pick: (f) => f.waived !== undefined },
];

const margin = (m: number | null) => (m === null ? '—' : formatQuantity(m, 'V'));

function FindingItem({ finding }: { finding: ReportFinding }) {
  return (
    <li className={`finding finding-${finding.waived === undefined ? finding.severity : 'waived'}`} data-finding-id={finding.id}>
      <div className="finding-head">
        <code className="rule">{finding.rule}</code>
        <span className="where">
          {finding.net === null ? 'no net' : <>net <code>{finding.net}</code></>} · {finding.scenario}
        </span>
      </div>
      <p className="message">{finding.message}</p>
      <p className="hint">
        <span className="label">Remedy</span> {finding.hint}
      </p>
      {finding.waived !== undefined && (
        <p className="hint">
          <span className="label">Waived ({finding.severity})</span> {finding.waived}
        </p>
      )}
    </li>
  );
}

function Summary({ report, ms }: { report: Report; ms: number }) {
  const v = verdict(report);
  const tiles: [string, string, number][] = [
    ['error', 'Errors', report.summary.error],
    ['warning', 'Warnings', report.summary.warning],
    ['info', 'Information', report.summary.info],
    ['waived', 'Waived', report.summary.waived],
  ];
  return (
    <section className="summary" aria-label="Summary">
      <div className="tiles">
        {tiles.map(([key, label, n]) => (
          <div key={key} className={`tile tile-${key}`} data-count={key}>
            <span className="count">{n}</span>
            <span className="tile-label">{label}</span>
          </div>
        ))}
      </div>
      <p className={`verdict ${v.fails ? 'verdict-fail' : 'verdict-pass'}`}>{v.line}</p>
      <p className="meta">
        {report.design.parts} parts, {report.design.nets} nets, {report.design.rails} rails;{' '}
        {report.scenarios.length} power state{report.scenarios.length === 1 ? '' : 's'}; minimum margin{' '}
        {formatQuantity(report.settings.minMargin, 'V')}; checked in {ms.toFixed(1)} ms by {report.tool}.
      </p>
    </section>
  );
}

function Crossings({ report }: { report: Report }) {
  if (report.crossings.length === 0) return null;
  return (
    <section aria-labelledby="crossings">
      <h2 id="crossings">Rail crossings</h2>
      <table>
        <thead>
          <tr>
            <th>Net</th><th>Rails</th><th>Power state</th><th className="num">Worst NMH</th><th className="num">Worst NML</th><th>Worst</th>
          </tr>
        </thead>
        <tbody>
          {report.crossings.map((c) => (
            <tr key={`${c.scenario}/${c.net}`}>
              <td><code>{c.net}</code>{c.label !== c.net ? ` (${c.label})` : ''}</td>
              <td>{c.rails.join(', ')}</td>
              <td>{c.scenario}</td>
              <td className="num">{margin(c.marginHigh)}</td>
              <td className="num">{margin(c.marginLow)}</td>
              <td><span className={`badge badge-${c.worst}`}>{c.worst}</span></td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}

/** The start page. */
export function StartPage() {
  return (
    <div className="page">
      <header className="masthead">
        <h1>Railcross</h1>
        <p>Plan and check the signals between chips on a mixed-rail board.</p>
      </header>
      <main>
        <section className="placeholder" aria-label="Editor">
          <p>
            The block-diagram editor comes here. Until then, this page reads the example design and checks it in
            your browser with the same rule engine as <code>railcross check</code>.
          </p>
        </section>
        {loaded.ok ? (
          <>
            <h2 className="design-title">Example: {loaded.report.design.title}</h2>
            <Summary report={loaded.report} ms={loaded.ms} />
            {GROUPS.map((g) => {
              const items = loaded.report.findings.filter(g.pick);
              if (items.length === 0) return null;
              return (
                <section key={g.key} aria-labelledby={`group-${g.key}`} className="group">
                  <h2 id={`group-${g.key}`}>
                    {g.title} <span className="n">({items.length})</span>
                  </h2>
                  <ul className="findings">
                    {items.map((f) => (
                      <FindingItem key={f.id} finding={f} />
                    ))}
                  </ul>
                </section>
              );
            })}
            <Crossings report={loaded.report} />
          </>
        ) : (
          <section className="group">
            <h2>The example design does not read</h2>
            <ul>{loaded.errors.map((e) => <li key={e}><code>{e}</code></li>)}</ul>
          </section>
        )}
      </main>
      <footer className="cautions" aria-label="Cautions">
        <h2>Cautions</h2>
        {(loaded.ok ? loaded.report.cautions : []).map((c) => (
          <p key={c}>{c}</p>
        ))}
      </footer>
    </div>
  );
}
