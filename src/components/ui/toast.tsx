import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from "react";
import { Notice } from "./feedback";

type Toast = { id: number; title: string; detail?: string };
type Notify = (title: string, detail?: string) => void;

const ToastContext = createContext<Notify>(() => {});

/** How long a notice stays: long enough to read twice; it can be dismissed sooner. */
const SHOW_MS = 8_000;

/**
 * Confirms a step that worked: a notice in the corner, inside one live region that exists from
 * the start (role="status"), so screen readers announce each one without moving focus.
 */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((list) => list.filter((t) => t.id !== id)), []);
  const notify = useCallback<Notify>(
    (title, detail) => {
      const id = nextId.current++;
      setToasts((list) => [...list.slice(-2), { id, title, detail }]);
      setTimeout(() => dismiss(id), SHOW_MS);
    },
    [dismiss],
  );
  const value = useMemo(() => notify, [notify]);

  return (
    <ToastContext.Provider value={value}>
      {children}
      <div
        role="status"
        aria-live="polite"
        className="pointer-events-none fixed inset-x-4 bottom-4 z-40 grid gap-2 sm:left-auto sm:w-96"
      >
        {toasts.map((toast) => (
          <div key={toast.id} className="pointer-events-auto relative shadow-card [&>div]:pr-12" data-testid="toast">
            <Notice tone="ok" title={toast.title}>
              {toast.detail}
            </Notice>
            <button
              type="button"
              onClick={() => dismiss(toast.id)}
              className="absolute right-1 top-1 min-h-11 min-w-11 rounded-md text-lg text-ink-soft hover:bg-paper-deep"
              aria-label="Dismiss"
            >
              ×
            </button>
          </div>
        ))}
      </div>
    </ToastContext.Provider>
  );
}

/** `notify("Sent to the receiver", "They are asked to confirm it.")` after a step succeeds. */
export function useToast(): Notify {
  return useContext(ToastContext);
}
