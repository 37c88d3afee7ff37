// Short confirmations after an action ("Invitation sent"). They stay 6 s and are read out politely.
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';

type Toast = { id: number; tone: 'success' | 'warning' | 'error'; text: string };
type ToastApi = { show: (text: string, tone?: Toast['tone']) => void };

const ToastContext = createContext<ToastApi | null>(null);

const tones = {
  success: 'border-accent-300 bg-surface text-ink',
  warning: 'border-warn-200 bg-warn-50 text-warn-800',
  error: 'border-danger-200 bg-danger-50 text-danger-800',
} as const;

let nextId = 1;

export type ToastProviderProps = { children: ReactNode };

export function ToastProvider({ children }: ToastProviderProps) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const dismiss = useCallback((id: number) => setToasts((all) => all.filter((t) => t.id !== id)), []);
  const show = useCallback(
    (text: string, tone: Toast['tone'] = 'success') => {
      const id = nextId++;
      setToasts((all) => [...all.slice(-3), { id, tone, text }]);
      window.setTimeout(() => dismiss(id), 6000);
    },
    [dismiss],
  );
  const api = useMemo(() => ({ show }), [show]);
  return (
    <ToastContext value={api}>
      {children}
      <div aria-live="polite" className="no-print fixed right-4 bottom-4 z-50 flex w-96 flex-col gap-2">
        {toasts.map((t) => (
          <div
            key={t.id}
            role="status"
            className={`flex items-start gap-3 rounded border px-3 py-2 shadow-md ${tones[t.tone]}`}
          >
            <span
              className={`mt-1.5 size-2 shrink-0 rounded-full ${t.tone === 'success' ? 'bg-accent-600' : t.tone === 'warning' ? 'bg-warn-600' : 'bg-danger-600'}`}
            />
            <p className="flex-1">{t.text}</p>
            <button
              type="button"
              onClick={() => dismiss(t.id)}
              aria-label="Dismiss"
              className="text-ink-muted hover:text-ink"
            >
              ×
            </button>
          </div>
        ))}
      </div>
    </ToastContext>
  );
}

export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error('useToast must be used inside <ToastProvider>.');
  return api;
}
