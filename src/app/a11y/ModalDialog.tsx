import { useEffect, useRef, type KeyboardEvent, type ReactNode } from 'react';

interface ModalDialogProps {
  /** Id of the dialog's heading, which names it. */
  readonly titleId: string;
  readonly testId: string;
  readonly className?: string;
  /** Called on Escape, on a click on the backdrop, and by the dialog's own buttons. */
  onClose(): void;
  readonly children: ReactNode;
}

const FOCUSABLE =
  'a[href], button:not([disabled]), input:not([disabled]):not([type="hidden"]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

/**
 * A modal dialog on the native `<dialog>` element: `showModal()` moves focus into it and makes the rest
 * of the page inert; Tab and Shift+Tab wrap around inside it; Escape (the dialog's cancel event) and a
 * click on the backdrop close it; closing gives focus back to whatever had it before the dialog opened.
 * Mounted only while open.
 */
export function ModalDialog({ titleId, testId, className, onClose, children }: ModalDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const close = useRef(onClose);
  useEffect(() => {
    close.current = onClose;
  }, [onClose]);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    const opener = document.activeElement instanceof HTMLElement ? document.activeElement : null;
    if (!dialog.open) dialog.showModal();
    return () => {
      if (dialog.open) dialog.close();
      if (opener?.isConnected) opener.focus();
    };
  }, []);

  const wrapTab = (e: KeyboardEvent<HTMLDialogElement>) => {
    if (e.key !== 'Tab') return;
    const items = [...e.currentTarget.querySelectorAll<HTMLElement>(FOCUSABLE)].filter(
      (el) => el.offsetParent !== null,
    );
    const first = items[0];
    const last = items[items.length - 1];
    if (!first || !last) return;
    if (e.shiftKey && document.activeElement === first) {
      e.preventDefault();
      last.focus();
    } else if (!e.shiftKey && document.activeElement === last) {
      e.preventDefault();
      first.focus();
    }
  };

  return (
    <dialog
      ref={ref}
      className={`modal ${className ?? ''}`}
      aria-labelledby={titleId}
      data-testid={testId}
      onCancel={(e) => {
        e.preventDefault();
        close.current();
      }}
      onKeyDown={wrapTab}
      onClick={(e) => {
        // A click on the backdrop lands on the dialog element itself; the content sits in the inner box.
        if (e.target === e.currentTarget) close.current();
      }}
    >
      <div className="modal-body">{children}</div>
    </dialog>
  );
}
