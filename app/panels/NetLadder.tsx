/**
 * The selected net's voltage ladder in the chosen power state, drawn from the engine's
 * analysis (the view object changes only when the net is re-checked, so the memo holds).
 */
import { useMemo } from 'react';
import { ladderFor } from '../../rules/report/ladder.ts';
import { VoltageLadder } from '../ladder/VoltageLadder.tsx';
import { useEditor } from '../store/EditorProvider.tsx';

export function NetLadder({ net }: { net: string }) {
  const view = useEditor((s) => s.result.nets.get(s.powerState)?.get(net)?.view);
  const state = useEditor((s) => s.result.states.find((p) => p.id === s.powerState));
  const ladder = useMemo(
    () => (view === undefined || state === undefined ? undefined : ladderFor(view, state)),
    [view, state],
  );
  if (ladder === undefined) return null;
  return (
    <section className="rc-net-ladder" aria-label={`Voltage ladder of ${net}`} data-testid="net-ladder">
      <h4 className="rc-sub">Voltage ladder</h4>
      <div className="rc-ladder-scroll">
        <VoltageLadder ladder={ladder} />
      </div>
    </section>
  );
}
