/** The top bar's Export menu: the design file, and the report as JSON, Markdown or PDF. */
import { useEffect, useRef, useState } from 'react';
import { exportDesignFile } from './download.ts';
import { exportReportJson, exportReportMarkdown, exportReportPdf } from './reportExport.ts';
import { useSession, useSessionState } from './SessionProvider.tsx';

export function ExportMenu() {
  const session = useSession();
  const task = useSessionState((s) => s.task);
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!open) return undefined;
    const onDown = (e: PointerEvent) => {
      if (!(e.target instanceof Node) || !box.current?.contains(e.target)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') setOpen(false);
      if (e.key !== 'ArrowDown' && e.key !== 'ArrowUp') return;
      // Arrow keys move between the items, as in any menu.
      const items = [...(box.current?.querySelectorAll<HTMLButtonElement>('[role="menuitem"]:not(:disabled)') ?? [])];
      const at = items.indexOf(document.activeElement as HTMLButtonElement);
      const next = items[(at + (e.key === 'ArrowDown' ? 1 : items.length - 1)) % items.length];
      e.preventDefault();
      next?.focus();
    };
    addEventListener('pointerdown', onDown);
    addEventListener('keydown', onKey);
    box.current?.querySelector<HTMLButtonElement>('[role="menuitem"]')?.focus();
    return () => {
      removeEventListener('pointerdown', onDown);
      removeEventListener('keydown', onKey);
    };
  }, [open]);

  const run = (action: () => void) => () => {
    setOpen(false);
    action();
  };
  const busy = task !== null;

  return (
    <div className="rc-menu" ref={box}>
      <button
        type="button"
        aria-haspopup="menu"
        aria-expanded={open}
        data-testid="export-menu"
        aria-busy={busy}
        onClick={() => setOpen(!open)}
      >
        {busy ? (
          <>
            <span className="rc-spinner" aria-hidden="true" /> Exporting…
          </>
        ) : (
          'Export ▾'
        )}
      </button>
      {busy && (
        <span className="rc-sr" role="status">
          {task}
        </span>
      )}
      {open && (
        <div className="rc-menu-list" role="menu" aria-label="Export">
          <button
            type="button"
            role="menuitem"
            data-testid="export-design"
            onClick={run(() => exportDesignFile(session.editor.getState().design))}
          >
            Design file <span className="rc-menu-note">.railcross.json</span>
          </button>
          <button
            type="button"
            role="menuitem"
            data-testid="export-report-json"
            onClick={run(() => exportReportJson(session))}
          >
            Report (JSON) <span className="rc-menu-note">for scripts and reviews</span>
          </button>
          <button
            type="button"
            role="menuitem"
            data-testid="export-report-md"
            onClick={run(() => exportReportMarkdown(session))}
          >
            Report (Markdown) <span className="rc-menu-note">for a review or pull request</span>
          </button>
          <button
            type="button"
            role="menuitem"
            data-testid="export-report-pdf"
            disabled={busy}
            onClick={run(() => void exportReportPdf(session))}
          >
            Report (PDF) <span className="rc-menu-note">to print or send</span>
          </button>
        </div>
      )}
      {busy && (
        <div className="rc-task" data-testid="task" role="progressbar" aria-label={task}>
          {task}
        </div>
      )}
    </div>
  );
}
