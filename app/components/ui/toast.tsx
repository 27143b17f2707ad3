import { useEffect, useState } from "react";

export type ToastMessage = { kind: "success" | "error" | "info"; message: string };

const KINDS: Record<ToastMessage["kind"], string> = {
  success: "border-action bg-action-tint text-action-strong",
  error: "border-danger bg-danger-tint text-danger",
  info: "border-info bg-info-tint text-info",
};

/** Shows a one-time message from the server (a flashed session value) and fades it after a while. */
export function Toast({ toast }: { toast: ToastMessage | null }) {
  const [visible, setVisible] = useState(Boolean(toast));
  useEffect(() => {
    setVisible(Boolean(toast));
    if (!toast) return;
    const timer = setTimeout(() => setVisible(false), 6000);
    return () => clearTimeout(timer);
  }, [toast]);
  if (!toast || !visible) return null;
  return (
    <div role="status" className={`fixed right-4 bottom-4 z-50 max-w-sm rounded-lg border-l-4 px-4 py-3 text-sm shadow-sheet ${KINDS[toast.kind]}`}>
      <div className="flex items-start gap-3">
        <p className="flex-1">{toast.message}</p>
        <button type="button" onClick={() => setVisible(false)} aria-label="Dismiss" className="font-bold">
          ×
        </button>
      </div>
    </div>
  );
}
