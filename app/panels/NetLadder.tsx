/**
 * The selected net's voltage ladder in the chosen power state, drawn from the engine's
 * analysis (the view object changes only when the net is re-checked, so the memo holds). In
 * the side panel it is scaled to the column, whole; "Open wide" shows it at full size in a view
 * of its own, as wide as the drawing (scaled down only where the window is narrower).
 */
import { useMemo, useState } from 'react';
import { ladderFor } from '../../rules/report/index.ts';
import { ladderWidth, VoltageLadder } from '../ladder/VoltageLadder.tsx';
import { useEditor } from '../store/EditorProvider.tsx';
import { labelOr } from '../../rules/engine/index.ts';
import { Modal } from './Modal.tsx';

/** The dialog's padding and border around the drawing, px (styles.css .rc-modal-body). */
const DIALOG_FRAME = 32;

export function NetLadder({ net }: { net: string }) {
  const view = useEditor((s) => s.result.nets.get(s.powerState)?.get(net)?.view);
  const state = useEditor((s) => s.result.states.find((p) => p.id === s.powerState));
  const [wide, setWide] = useState(false);
  const rails = useEditor((s) => s.design.rails);
  const railName = useMemo(() => {
    const labels = new Map(rails.map((r) => [r.id, labelOr(r.label, r.id)]));
    return (id: string) => labels.get(id) ?? id;
  }, [rails]);
  const ladder = useMemo(
    () => (view === undefined || state === undefined ? undefined : ladderFor(view, state)),
    [view, state],
  );
  if (ladder === undefined) return null;
  const label = ladder.label;
  return (
    <section className="rc-net-ladder" aria-label={`Voltage ladder of ${label}`} data-testid="net-ladder">
      <div className="rc-ladder-head">
        <h4 className="rc-sub">Voltage ladder</h4>
        <button
          type="button"
          className="rc-link"
          data-testid="ladder-wide"
          aria-haspopup="dialog"
          onClick={() => setWide(true)}
        >
          Open wide
        </button>
      </div>
      <div className="rc-ladder-scroll">
        <VoltageLadder ladder={ladder} fit railName={railName} />
      </div>
      {wide && (
        <Modal
          title={`Voltage ladder of ${label} · ${ladder.state.label}`}
          onClose={() => setWide(false)}
          testId="ladder-dialog"
          wide
          width={ladderWidth(ladder) + DIALOG_FRAME}
        >
          <VoltageLadder ladder={ladder} height={520} fit railName={railName} />
        </Modal>
      )}
    </section>
  );
}
