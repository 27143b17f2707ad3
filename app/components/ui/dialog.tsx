import { useEffect, useRef, type ReactNode } from "react";

/** A modal on the native <dialog> element, so focus trapping and Escape come from the browser. */
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
      className="m-auto w-full max-w-md rounded-lg bg-sheet p-6 text-ink shadow-sheet backdrop:bg-ink/40"
    >
      <h2 id="dialog-title" className="mb-4">
        {title}
      </h2>
      {children}
    </dialog>
  );
}
