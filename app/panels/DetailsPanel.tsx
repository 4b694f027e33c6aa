/** The details of the selection (a part, or a net), then the rails and the power states. */
import { memo, useState } from 'react';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';
import { partById } from '../store/lookup.ts';
import { NetDetails } from './NetDetails.tsx';
import { PartDetails } from './PartDetails.tsx';
import { DiscreteDetails } from './DiscreteDetails.tsx';
import { PowerStatesEditor as PowerStatesView } from './PowerStatesEditor.tsx';
import { ProfilesEditor as ProfilesView } from './ProfilesEditor.tsx';
import { RailsEditor as RailsView } from './RailsEditor.tsx';

// The folds read their own slices of the store: a change of the selected part need not redraw them.
const RailsEditor = memo(RailsView);
const PowerStatesEditor = memo(PowerStatesView);
const ProfilesEditor = memo(ProfilesView);

export function DetailsPanel() {
  const part = useEditor((s) =>
    s.selection.parts.length === 1 ? partById(s.design.parts, s.selection.parts[0]!) : undefined,
  );
  const discrete = useEditor((s) =>
    s.selection.parts.length === 1 ? s.design.discretes?.find((d) => d.id === s.selection.parts[0]) : undefined,
  );
  const net = useEditor((s) =>
    s.selection.net === null ? undefined : s.design.nets.find((n) => n.id === s.selection.net),
  );
  const many = useEditor((s) => s.selection.parts.length + s.selection.wires.length);
  // A design opened with no parts (a new one) shows its rails, the first thing to set; the panel
  // mounts afresh with each design opened, so this is read once, and the fold is the user's after.
  const store = useEditorStore();
  const [railsOpen] = useState(() => store.getState().design.parts.length === 0);
  return (
    <section className="rc-details" aria-label="Details">
      <h2 className="rc-panel-head">Details</h2>
      <div className="rc-details-body">
        {part !== undefined ? (
          <PartDetails part={part} />
        ) : discrete !== undefined ? (
          <DiscreteDetails part={discrete} />
        ) : net !== undefined ? (
          <NetDetails net={net} />
        ) : (
          <p className="rc-empty">
            {many > 1
              ? `${many} items selected: Delete removes them; Ctrl+C copies the chips, arrow keys move them.`
              : 'Select a chip or a wire to edit it.'}
          </p>
        )}
        <details className="rc-fold" open={railsOpen} data-testid="rails-fold">
          <summary>Rails</summary>
          <RailsEditor />
        </details>
        <details className="rc-fold">
          <summary>Power states</summary>
          <PowerStatesEditor />
        </details>
        <details className="rc-fold" data-testid="profiles-fold">
          <summary>Profiles of this design</summary>
          <ProfilesEditor />
        </details>
      </div>
    </section>
  );
}
