import { useCallback, useMemo, useRef, useState, type ReactNode } from 'react';
import { ToastContext, type ToastApi, type ToastTone } from './toast-context';

interface Toast {
  id: number;
  message: string;
  tone: ToastTone;
}

const tones: Record<ToastTone, string> = {
  ok: 'border-l-ok',
  danger: 'border-l-danger',
  info: 'border-l-accent',
};

/** Provides `useToast` and renders the live region the messages appear in. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((all) => all.filter((t) => t.id !== id)), []);

  const show = useCallback<ToastApi['show']>(
    (message, tone = 'info') => {
      const id = nextId.current++;
      setToasts((all) => [...all.slice(-3), { id, message, tone }]);
      if (tone !== 'danger') window.setTimeout(() => dismiss(id), 5000);
    },
    [dismiss],
  );

  const api = useMemo(() => ({ show }), [show]);

  return (
    <ToastContext value={api}>
      {children}
      <section aria-label="Notifications" aria-live="polite" className="pointer-events-none fixed right-4 bottom-4 z-50 flex w-80 max-w-[calc(100vw-2rem)] flex-col gap-2">
        {toasts.map((t) => (
          <div
            key={t.id}
            role={t.tone === 'danger' ? 'alert' : 'status'}
            className={`pointer-events-auto flex items-start gap-3 rounded-md border border-l-4 border-rule bg-sheet px-4 py-3 text-sm shadow-lg ${tones[t.tone]}`}
          >
            <p className="flex-1">{t.message}</p>
            <button type="button" onClick={() => dismiss(t.id)} className="text-ink-faint hover:text-ink" aria-label="Dismiss notification">
              ×
            </button>
          </div>
        ))}
      </section>
    </ToastContext>
  );
}
