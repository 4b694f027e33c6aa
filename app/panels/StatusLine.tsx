/** The status line: the last re-check (how many nets, how long), a refusal or an undo, the save state. */
import { useSyncExternalStore } from 'react';
import type { SaveIndicator, SaveStatus } from '../storage/saver.ts';
import { useEditor, useEditorStore } from '../store/EditorProvider.tsx';

function saveText(s: SaveStatus): string {
  switch (s.state) {
    case 'idle':
      return '';
    case 'pending':
    case 'saving':
      return 'Saving…';
    case 'saved':
      return 'Saved in this browser';
    case 'failed':
      return `Not saved: ${s.error}`;
  }
}

export function StatusLine({ saver }: { saver: SaveIndicator }) {
  const store = useEditorStore();
  const check = useEditor((s) => s.lastCheck);
  const notice = useEditor((s) => s.notice);
  const save = useSyncExternalStore(
    (l) => saver.subscribe(l),
    () => saver.status,
  );
  const ms = check.ms < 10 ? check.ms.toFixed(2) : check.ms.toFixed(0);
  return (
    <footer className="rc-status">
      <span className="rc-status-check" data-testid="status-check" data-nets={check.netsChecked}>
        {check.action}: re-checked {check.netsChecked} {check.netsChecked === 1 ? 'net' : 'nets'} in {ms} ms
      </span>
      {notice !== null && (
        <span className={`rc-notice rc-notice--${notice.kind}`} role="status" data-testid="notice">
          {notice.kind === 'refused' ? 'Refused: ' : ''}
          {notice.text}
          <button
            type="button"
            className="rc-icon-btn"
            aria-label="Dismiss"
            onClick={() => store.getState().notify(null)}
          >
            ×
          </button>
        </span>
      )}
      <span className={`rc-save rc-save--${save.state}`} data-testid="save-status" data-state={save.state}>
        {saveText(save)}
      </span>
    </footer>
  );
}
