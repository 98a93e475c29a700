import { useState, type ReactNode } from 'react';
import { Button } from './button';

interface ConfirmButtonProps {
  children: ReactNode;
  /** The question shown after the first press, e.g. "Remove Ada from this engagement?" */
  question: string;
  confirmLabel: string;
  onConfirm: () => void;
  busy?: boolean;
  variant?: 'danger' | 'secondary';
}

/** A two-step button for actions that are hard to undo; no modal, keyboard friendly. */
export function ConfirmButton({ children, question, confirmLabel, onConfirm, busy, variant = 'danger' }: ConfirmButtonProps) {
  const [asking, setAsking] = useState(false);
  if (!asking) {
    return (
      <Button size="sm" variant={variant} onClick={() => setAsking(true)} busy={busy}>
        {children}
      </Button>
    );
  }
  return (
    <span role="group" aria-label={question} className="inline-flex flex-wrap items-center gap-2">
      <span className="text-sm text-ink-soft">{question}</span>
      <Button
        size="sm"
        variant={variant}
        autoFocus
        onClick={() => {
          setAsking(false);
          onConfirm();
        }}
      >
        {confirmLabel}
      </Button>
      <Button size="sm" variant="quiet" onClick={() => setAsking(false)}>
        Cancel
      </Button>
    </span>
  );
}
