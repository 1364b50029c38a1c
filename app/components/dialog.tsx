import { useEffect, useRef, type ReactNode } from "react";

/** A modal on the native <dialog> element: focus trap, Escape to close. */
export function Dialog({ open, onClose, title, children }: { open: boolean; onClose: () => void; title: string; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
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
      aria-labelledby="dialog-title"
      className="m-auto w-full max-w-md rounded-card border border-ink-200 p-0 shadow-lg backdrop:bg-ink-900/40"
    >
      <div className="p-5">
        <h2 id="dialog-title" className="mb-3 text-base font-semibold text-ink-900">
          {title}
        </h2>
        {children}
      </div>
    </dialog>
  );
}
