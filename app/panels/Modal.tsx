/**
 * A modal dialog of the editor, named by its heading, with a close button and an optional
 * footer: a native dialog (NativeDialog), so Escape or a press on the backdrop closes it and
 * the page behind stays inert.
 */
import { useId, type ReactNode } from 'react';
import { NativeDialog } from './NativeDialog.tsx';

export function Modal({
  title,
  onClose,
  children,
  footer,
  wide,
  width,
  testId,
}: {
  title: string;
  onClose: () => void;
  children: ReactNode;
  footer?: ReactNode;
  wide?: boolean;
  /** The width its content needs, px: the dialog takes it, up to the window's width less a margin. */
  width?: number;
  testId?: string;
}) {
  const headingId = useId();
  return (
    <NativeDialog
      className={`rc-modal${wide === true ? ' rc-modal--wide' : ''}`}
      labelledBy={headingId}
      onClose={onClose}
      {...(width === undefined ? {} : { style: { width: `min(${Math.ceil(width)}px, calc(100vw - 40px))` } })}
      {...(testId === undefined ? {} : { testId })}
    >
      <header className="rc-modal-head">
        <h2 id={headingId}>{title}</h2>
        <button type="button" className="rc-icon-btn" aria-label="Close" onClick={onClose}>
          ×
        </button>
      </header>
      <div className="rc-modal-body">{children}</div>
      {footer !== undefined && <footer className="rc-modal-foot">{footer}</footer>}
    </NativeDialog>
  );
}
