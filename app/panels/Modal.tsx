/**
 * A modal dialog of the editor, named by its heading: the browser's own modal `<dialog>`, which
 * keeps the focus inside and the page behind it inert. Escape, the close button or a press on
 * the backdrop closes it.
 */
import { useEffect, useId, useRef, type ReactNode } from 'react';

export function Modal({ title, onClose, children, footer, wide, testId }: {
  title: string;
  onClose: () => void;
  children: ReactNode;
  footer?: ReactNode;
  wide?: boolean;
  testId?: string;
}) {
  const headingId = useId();
  const ref = useRef<HTMLDialogElement>(null);

  useEffect(() => {
    const dialog = ref.current;
    if (dialog === null) return;
    if (!dialog.open) dialog.showModal();
    dialog.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    return () => dialog.close();
  }, []);

  return (
    <dialog ref={ref} className={`rc-modal${wide === true ? ' rc-modal--wide' : ''}`} aria-labelledby={headingId} data-testid={testId}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
      onMouseDown={(e) => {
        // Only a press outside the content box reaches the dialog element itself: the backdrop.
        if (e.target !== e.currentTarget) return;
        const r = e.currentTarget.getBoundingClientRect();
        if (e.clientX < r.left || e.clientX > r.right || e.clientY < r.top || e.clientY > r.bottom) onClose();
      }}>
      <header className="rc-modal-head">
        <h2 id={headingId}>{title}</h2>
        <button type="button" className="rc-icon-btn" aria-label="Close" onClick={onClose}>×</button>
      </header>
      <div className="rc-modal-body">{children}</div>
      {footer !== undefined && <footer className="rc-modal-foot">{footer}</footer>}
    </dialog>
  );
}
