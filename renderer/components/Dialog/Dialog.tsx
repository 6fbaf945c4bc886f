// A modal dialog: labelled, focus moved inside on open and returned on close, Escape closes,
// Tab cycles within. Used by the about box, the first-run notice, the import panel and the
// unsaved-changes prompt.

import { useEffect, useRef, type ReactNode } from 'react';

export interface DialogProps {
  title: string;
  onClose(): void;
  children: ReactNode;
  /** Extra class for sizing. */
  className?: string;
  /** Set for notices that must be acknowledged with their button (Escape does nothing). */
  requireButton?: boolean;
  /** Id of the element that describes the dialog (its question), for aria-describedby. */
  describedBy?: string;
}

export function Dialog({ title, onClose, children, className, requireButton, describedBy }: DialogProps) {
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const before = document.activeElement as HTMLElement | null;
    const first = box.current?.querySelector<HTMLElement>('button, [href], input, select, textarea, [tabindex]:not([tabindex="-1"])');
    (first ?? box.current)?.focus();
    return () => before?.focus?.();
  }, []);
  const onKeyDown = (event: React.KeyboardEvent) => {
    if (event.key === 'Escape' && !requireButton) {
      event.stopPropagation();
      onClose();
    }
    if (event.key !== 'Tab' || !box.current) return;
    const focusable = [...box.current.querySelectorAll<HTMLElement>('button, [href], input, select, textarea, [tabindex]:not([tabindex="-1"])')].filter((el) => !el.hasAttribute('disabled'));
    if (focusable.length === 0) return;
    const first = focusable[0];
    const last = focusable[focusable.length - 1];
    if (event.shiftKey && document.activeElement === first) {
      event.preventDefault();
      last.focus();
    } else if (!event.shiftKey && document.activeElement === last) {
      event.preventDefault();
      first.focus();
    }
  };
  const titleId = `dlg-${title.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <div className="lw-backdrop">
      <div className={`lw-dialog ${className ?? ''}`} role="dialog" aria-modal="true" aria-labelledby={titleId} aria-describedby={describedBy} ref={box} tabIndex={-1} onKeyDown={onKeyDown}>
        <h2 id={titleId}>{title}</h2>
        {children}
      </div>
    </div>
  );
}
