/**
 * Another tab changed or deleted the open design. Nothing has been written over either
 * version: this tab's saves are held until the user chooses.
 */
import { useEffect, useRef, useState } from 'react';
import { NativeDialog } from '../panels/NativeDialog.tsx';
import { shortWhen } from './when.ts';
import type { Conflict } from './session.ts';
import { useSession, useSessionState } from './SessionProvider.tsx';

function text(conflict: Conflict, title: string, unsaved: boolean): { head: string; body: string } {
  const mine = unsaved ? 'Your latest changes in this tab are not saved yet' : 'This tab has nothing unsaved';
  if (conflict.kind === 'changed') {
    return {
      head: 'This design was changed in another tab',
      body: `Another tab saved “${title}” at ${shortWhen(conflict.savedAt)} (revision ${conflict.rev}). ${mine}; nothing has been overwritten.`,
    };
  }
  return {
    head: conflict.restorable
      ? 'This design was deleted in another tab'
      : 'This design was deleted for good in another tab',
    body: `${mine}. ${conflict.restorable ? 'It is in Recently deleted and can be restored.' : 'Keep this tab’s version as a new design to go on.'}`,
  };
}

export function ConflictPrompt() {
  const session = useSession();
  const conflict = useSessionState((s) => s.conflict);
  const open = useSessionState((s) => s.open);
  const first = useRef<HTMLButtonElement>(null);
  const [busy, setBusy] = useState(false);
  // biome-ignore lint/correctness/useExhaustiveDependencies: each new conflict takes the focus again
  useEffect(() => first.current?.focus(), [conflict]);
  if (conflict === null) return null;
  const title = open.store.getState().design.title;
  const { head, body } = text(conflict, title, open.saver.unsaved);
  const choose = (choice: 'reload' | 'restore' | 'copy') => () => {
    setBusy(true);
    void session.resolveConflict(choice).finally(() => setBusy(false));
  };
  return (
    <NativeDialog
      className="rc-conflict"
      role="alertdialog"
      labelledBy="rc-conflict-head"
      describedBy="rc-conflict-body"
      testId="conflict"
    >
      <h2 id="rc-conflict-head">{head}</h2>
      <p id="rc-conflict-body">{body}</p>
      <div className="rc-dialog-actions">
        {conflict.kind === 'changed' && (
          <button
            type="button"
            ref={first}
            className="rc-primary"
            disabled={busy}
            data-testid="conflict-reload"
            onClick={choose('reload')}
          >
            Load the other tab’s version
          </button>
        )}
        {conflict.kind === 'deleted' && conflict.restorable && (
          <button
            type="button"
            ref={first}
            className="rc-primary"
            disabled={busy}
            data-testid="conflict-restore"
            onClick={choose('restore')}
          >
            Restore it and keep editing
          </button>
        )}
        <button
          type="button"
          ref={conflict.kind === 'deleted' && !conflict.restorable ? first : undefined}
          disabled={busy}
          data-testid="conflict-copy"
          onClick={choose('copy')}
        >
          Keep mine as a copy
        </button>
      </div>
      {conflict.kind === 'changed' && (
        <p className="rc-dialog-foot">Loading the other version is one step: Undo brings this tab’s version back.</p>
      )}
    </NativeDialog>
  );
}
