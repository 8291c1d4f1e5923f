import { useCallback, useEffect, useRef, useState, type ReactNode } from "react";
import { cx } from "../../lib/cx.ts";
import { ToastContext, type ToastTone } from "./toast-context.ts";

type Toast = { id: number; message: string; tone: ToastTone };

// Errors stay longer: they usually need reading, not just noticing.
const lifetimes: Record<ToastTone, number> = { success: 5000, error: 9000 };

export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);
  const timers = useRef(new Map<number, ReturnType<typeof setTimeout>>());

  const dismiss = useCallback((id: number) => {
    clearTimeout(timers.current.get(id));
    timers.current.delete(id);
    setToasts((all) => all.filter((t) => t.id !== id));
  }, []);

  const show = useCallback(
    (message: string, tone: ToastTone = "success") => {
      const id = nextId.current++;
      setToasts((all) => [...all.slice(-3), { id, message, tone }]);
      timers.current.set(id, setTimeout(() => dismiss(id), lifetimes[tone]));
    },
    [dismiss],
  );

  useEffect(() => {
    const pending = timers.current;
    return () => {
      for (const timer of pending.values()) clearTimeout(timer);
    };
  }, []);

  return (
    <ToastContext value={show}>
      {children}
      <div
        role="status"
        aria-live="polite"
        className="pointer-events-none fixed inset-x-0 bottom-0 z-50 flex flex-col items-center gap-2 p-4 sm:items-end"
      >
        {toasts.map((toast) => (
          <div
            key={toast.id}
            className={cx(
              "pointer-events-auto flex w-full max-w-sm items-start gap-3 rounded-md border px-4 py-3 text-sm shadow-lg",
              toast.tone === "error" ? "border-alert/40 bg-alert-wash text-alert" : "border-line bg-ink text-paper",
            )}
          >
            <p className="flex-1 font-medium">{toast.message}</p>
            <button
              type="button"
              onClick={() => dismiss(toast.id)}
              className="-my-0.5 rounded px-1 text-xs font-semibold underline-offset-2 hover:underline"
            >
              Dismiss
            </button>
          </div>
        ))}
      </div>
    </ToastContext>
  );
}
