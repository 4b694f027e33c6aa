/**
 * A net's level analysis in the chosen power state: every driver/receiver pair, each side
 * (high, low) with the output level, the threshold, the margin and the corner (the supply
 * voltages of driver and receiver) where it is worst, as the engine found it.
 */
import type { LevelSide, PairStatus } from '../../rules/engine/index.ts';
import { formatQuantity } from '../../rules/levels/index.ts';
import { useEditor } from '../store/EditorProvider.tsx';

const STATUS_TEXT: Readonly<Record<PairStatus, string>> = { pass: 'passes', warning: 'thin', fail: 'fails' };

const v = (x: number) => formatQuantity(x, 'V', 3);

function corner(side: LevelSide): string {
  const driver =
    side.driverVdd === null
      ? `pulled up to ${side.vpull === undefined ? '?' : v(side.vpull)}`
      : `driver VDD ${v(side.driverVdd)}`;
  const load = side.load > 0 ? `, load ${formatQuantity(side.load, 'A', 3)}` : '';
  return `at ${driver}, receiver VDD ${v(side.receiverVdd)}${load}`;
}

function SideRow({ side, high }: { side: LevelSide | null; high: boolean }) {
  const name = high ? 'High' : 'Low';
  if (side === null) {
    return (
      <tr className="rc-lvl-none">
        <th scope="row">{name}</th>
        <td colSpan={2} className="rc-muted">
          not judged: a level is not given
        </td>
      </tr>
    );
  }
  return (
    <tr className={`rc-lvl rc-lvl--${side.status}`} data-side={high ? 'high' : 'low'} data-status={side.status}>
      <th scope="row">{name}</th>
      <td>
        <span className="rc-mono">
          {high ? 'VOH' : 'VOL'} {v(side.out)}
          {side.estimate ? '*' : ''} · {high ? 'VIH' : 'VIL'} {v(side.threshold)}
        </span>
        <span className="rc-corner">{corner(side)}</span>
      </td>
      <td className="rc-margin-cell">
        <span className="rc-mono" data-margin={high ? 'high' : 'low'}>
          {high ? 'NMH' : 'NML'} {v(side.margin)}
        </span>
        <span className={`rc-status rc-status--${side.status}`}>{STATUS_TEXT[side.status]}</span>
      </td>
    </tr>
  );
}

export function NetAnalysis({ net }: { net: string }) {
  const analysis = useEditor((s) => s.result.nets.get(s.powerState)?.get(net)?.view.analysis);
  const state = useEditor((s) => s.result.states.find((st) => st.id === s.powerState)?.label ?? s.powerState);
  if (analysis === undefined) return null;
  return (
    <section className="rc-analysis" aria-label="Level analysis" data-testid="net-analysis">
      <h4 className="rc-sub">
        Level analysis <span className="rc-muted">· {state}</span>
      </h4>
      {analysis.pairs.length === 0 ? (
        <p className="rc-muted">No driver and receiver pair to judge in this power state.</p>
      ) : (
        <table className="rc-pairs">
          <thead>
            <tr>
              <th scope="col">Side</th>
              <th scope="col">Levels, at the worst corner</th>
              <th scope="col">Margin</th>
            </tr>
          </thead>
          {analysis.pairs.map((p) => (
            <tbody key={`${p.driver}>${p.receiver}`} data-pair={`${p.driver}>${p.receiver}`}>
              <tr className="rc-pair-head">
                <th scope="rowgroup" colSpan={3}>
                  <span className="rc-mono">{p.driver}</span> → <span className="rc-mono">{p.receiver}</span>
                </th>
              </tr>
              <SideRow side={p.high} high />
              <SideRow side={p.low} high={false} />
            </tbody>
          ))}
        </table>
      )}
      {analysis.pairs.some((p) => p.high?.estimate === true || p.low?.estimate === true) && (
        <p className="rc-muted">* estimated between the datasheet's load points.</p>
      )}
    </section>
  );
}
