import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Icon } from './icon';

export type ToastTone = 'ok' | 'info' | 'danger';

interface Toast {
  id: number;
  tone: ToastTone;
  message: string;
}

interface ToastApi {
  show: (message: string, tone?: ToastTone) => void;
  success: (message: string) => void;
  error: (message: string) => void;
}

const ToastContext = createContext<ToastApi | null>(null);

const lifetime: Record<ToastTone, number> = { ok: 5000, info: 6000, danger: 10000 };

const looks = {
  ok: { icon: 'check', className: 'text-ok-soft' },
  info: { icon: 'info', className: 'text-accent-soft' },
  danger: { icon: 'alert', className: 'text-danger-soft' },
} as const;

export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((all) => all.filter((t) => t.id !== id)), []);

  const show = useCallback(
    (message: string, tone: ToastTone = 'info') => {
      const id = nextId.current++;
      setToasts((all) => [...all.slice(-3), { id, tone, message }]);
      window.setTimeout(() => dismiss(id), lifetime[tone]);
    },
    [dismiss],
  );

  const api = useMemo<ToastApi>(
    () => ({ show, success: (m) => show(m, 'ok'), error: (m) => show(m, 'danger') }),
    [show],
  );

  return (
    <ToastContext value={api}>
      {children}
      {/* Sits above the phone's bottom bar; polite for news, assertive only for failures. */}
      <div className="no-print pointer-events-none fixed inset-x-0 bottom-20 z-50 flex flex-col items-center gap-2 px-3 sm:right-4 sm:bottom-4 sm:left-auto sm:items-end">
        <div aria-live="polite" className="contents">
          {toasts
            .filter((t) => t.tone !== 'danger')
            .map((t) => (
              <ToastCard key={t.id} toast={t} onDismiss={dismiss} />
            ))}
        </div>
        <div role="alert" className="contents">
          {toasts
            .filter((t) => t.tone === 'danger')
            .map((t) => (
              <ToastCard key={t.id} toast={t} onDismiss={dismiss} />
            ))}
        </div>
      </div>
    </ToastContext>
  );
}

function ToastCard({ toast, onDismiss }: { toast: Toast; onDismiss: (id: number) => void }) {
  return (
    <div className="pointer-events-auto flex w-full max-w-sm items-start gap-3 rounded-lg bg-ink py-2 pr-2 pl-4 text-surface-raised shadow-raised">
      <span className={cx('mt-3 shrink-0', looks[toast.tone].className)}>
        <Icon name={looks[toast.tone].icon} size={20} />
      </span>
      <p className="flex-1 py-2.5">{toast.message}</p>
      <button
        type="button"
        onClick={() => onDismiss(toast.id)}
        className="inline-flex min-h-touch min-w-touch items-center justify-center rounded-md hover:bg-white/10"
      >
        <Icon name="close" size={20} />
        <span className="sr-only">Dismiss</span>
      </button>
    </div>
  );
}

export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error('useToast needs a ToastProvider above it');
  return api;
}
