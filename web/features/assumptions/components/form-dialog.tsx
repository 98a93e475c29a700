import { useEffect, useId, useRef, type ReactNode } from 'react';

interface FormDialogProps {
  title: string;
  description?: ReactNode;
  onClose: () => void;
  children: ReactNode;
}

/**
 * A modal built on the native <dialog>: the browser traps focus, closes on Escape and returns
 * focus to the control that opened it, which a hand-made overlay would all have to imitate.
 */
export function FormDialog({ title, description, onClose, children }: FormDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const latestOnClose = useRef(onClose);
  useEffect(() => {
    latestOnClose.current = onClose;
  });
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    // Only a close the person asked for (Escape) reports back. The close in the cleanup
    // (unmount, or StrictMode's rehearsal) must not: its event arrives late, after the dialog
    // has been opened again, so a dialog that is open by then ignores it.
    const reportClose = () => {
      if (!dialog.open) latestOnClose.current();
    };
    dialog.addEventListener('close', reportClose);
    if (!dialog.open) dialog.showModal();
    return () => {
      dialog.removeEventListener('close', reportClose);
      if (dialog.open) dialog.close();
    };
  }, []);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      className="m-auto w-[min(40rem,calc(100vw-2rem))] rounded-lg border border-rule bg-sheet p-0 text-ink shadow-xl backdrop:bg-ink/40"
    >
      <div className="flex flex-col gap-4 px-6 py-5">
        <header>
          <h2 id={titleId} className="text-xl font-bold">
            {title}
          </h2>
          {description && <div className="mt-1 text-sm text-ink-soft">{description}</div>}
        </header>
        {children}
      </div>
    </dialog>
  );
}
