/** Messages from storage and files: a refused import, a failed save, records skipped on opening. */
import { useEffect } from 'react';
import type { Notice } from './session.ts';
import { useSession, useSessionState } from './SessionProvider.tsx';

/** How long a notice that needs no action stays, ms. */
const INFO_MS = 6000;

function NoticeCard({ notice }: { notice: Notice }) {
  const session = useSession();
  useEffect(() => {
    if (notice.tone !== 'info') return undefined;
    const timer = setTimeout(() => session.dismiss(notice.key), INFO_MS);
    return () => clearTimeout(timer);
  }, [session, notice]);
  return (
    <div
      className={`rc-note rc-note--${notice.tone}`}
      role={notice.tone === 'error' ? 'alert' : 'status'}
      data-notice={notice.key}
    >
      <div className="rc-note-head">
        <strong>{notice.title}</strong>
        <button type="button" className="rc-icon-btn" aria-label="Dismiss" onClick={() => session.dismiss(notice.key)}>
          ×
        </button>
      </div>
      {notice.lines.length > 0 && (
        <ul className="rc-note-lines">
          {notice.lines.map((line, i) => (
            // biome-ignore lint/suspicious/noArrayIndexKey: a notice's lines never change once shown
            <li key={i}>{line}</li>
          ))}
        </ul>
      )}
      {notice.actions !== undefined && (
        <div className="rc-note-actions">
          {notice.actions.map((a) => (
            <button type="button" key={a.label} onClick={a.run}>
              {a.label}
            </button>
          ))}
        </div>
      )}
    </div>
  );
}

export function Notices() {
  const notices = useSessionState((s) => s.notices);
  if (notices.length === 0) return null;
  return (
    <div className="rc-notes" data-testid="notices">
      {notices.map((n) => (
        <NoticeCard key={n.key} notice={n} />
      ))}
    </div>
  );
}
