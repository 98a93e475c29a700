import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const variants: Record<Variant, string> = {
  primary: 'bg-accent text-white hover:bg-accent-strong border border-accent',
  secondary: 'bg-sheet text-ink border border-rule-strong hover:border-ink-soft',
  quiet: 'bg-transparent text-accent border border-transparent hover:bg-accent-tint',
  danger: 'bg-sheet text-danger border border-danger/50 hover:bg-danger-tint',
};

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: 'sm' | 'md';
  /** Shows work in progress and blocks a second submit. */
  busy?: boolean;
}

export function Button({ variant = 'secondary', size = 'md', busy = false, className = '', disabled, children, type = 'button', ...rest }: ButtonProps) {
  const sizing = size === 'sm' ? 'px-2.5 py-1 text-sm' : 'px-4 py-2 text-sm';
  return (
    <button
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${sizing} ${variants[variant]} ${className}`}
      {...rest}
    >
      {children}
      {busy && <span className="sr-only"> (working)</span>}
    </button>
  );
}
