import { useEffect, useId, useRef, type ReactNode } from "react";

/** A modal on the native <dialog> element: focus trap, Escape to close. */
export function Dialog({ open, onClose, title, children }: { open: boolean; onClose: () => void; title: string; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      onClose={onClose}
      aria-labelledby={titleId}
      className="m-auto w-[calc(100%-2rem)] max-w-md rounded-sheet border border-ink-900 bg-sheet p-0 text-ink-900 shadow-lift backdrop:bg-ink-900/45"
    >
      <h2 id={titleId} className="border-b border-rule px-5 py-3 text-lg font-bold [overflow-wrap:anywhere]">
        {title}
      </h2>
      <div className="p-5">{children}</div>
    </dialog>
  );
}
