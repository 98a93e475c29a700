import { createContext } from 'react';

export type ToastTone = 'ok' | 'danger' | 'info';

export interface ToastApi {
  /** Shows a short message in the corner; errors stay until dismissed, the rest fade. */
  show: (message: string, tone?: ToastTone) => void;
}

export const ToastContext = createContext<ToastApi | null>(null);
