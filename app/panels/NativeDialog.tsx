import { useEffect, useRef, type CSSProperties, type ReactNode } from 'react';

interface NativeDialogProps {
  readonly className: string;
  readonly labelledBy: string;
  readonly describedBy?: string;
  readonly role?: 'dialog' | 'alertdialog';
  readonly testId?: string;
  readonly style?: CSSProperties;
  /** Escape or a click outside; absent: the user must choose inside. */
  readonly onClose?: () => void;
  readonly children: ReactNode;
}

/**
 * A native modal dialog: the browser keeps focus inside it and makes the page behind inert,
 * which a div with aria-modal cannot. Every dialog of the editor and the library is one.
 */
export function NativeDialog({
  className,
  labelledBy,
  describedBy,
  role,
  testId,
  style,
  onClose,
  children,
}: NativeDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (dialog !== null && !dialog.open) dialog.showModal();
    dialog?.querySelector<HTMLElement>('[data-autofocus]')?.focus();
    return () => dialog?.close();
  }, []);
  return (
    <dialog
      ref={ref}
      className={`rc-dialog ${className}`}
      role={role}
      aria-labelledby={labelledBy}
      aria-describedby={describedBy}
      data-testid={testId}
      style={style}
      // Keys pressed in a dialog are the dialog's: the editor's shortcuts (Delete, Ctrl+Z) listen on the window.
      onKeyDown={(e) => e.stopPropagation()}
      onCancel={(e) => {
        e.preventDefault();
        onClose?.();
      }}
      onMouseDown={(e) => {
        // The dialog element itself is hit only outside its content box: on the backdrop.
        if (e.target === e.currentTarget && onClose !== undefined) {
          const r = e.currentTarget.getBoundingClientRect();
          if (e.clientX < r.left || e.clientX > r.right || e.clientY < r.top || e.clientY > r.bottom) onClose();
        }
      }}
    >
      {children}
    </dialog>
  );
}
