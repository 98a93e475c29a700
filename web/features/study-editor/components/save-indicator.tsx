import type { SaveStatus } from '../api/use-autosave';

const time = new Intl.DateTimeFormat('en-GB', { timeStyle: 'short' });

const LOOK: Record<SaveStatus, { dot: string; text: (savedAt: Date | null) => string }> = {
  saved: { dot: 'bg-ok', text: (at) => (at ? `Saved at ${time.format(at)}` : 'Saved') },
  pending: { dot: 'bg-ink-faint', text: () => 'Changes not saved yet' },
  saving: { dot: 'bg-accent animate-pulse', text: () => 'Saving…' },
  offline: { dot: 'bg-warn', text: () => 'Offline — your text is kept here and saved when the connection returns' },
  conflict: { dot: 'bg-danger', text: () => 'Not saved — a newer version exists' },
  refused: { dot: 'bg-danger', text: () => 'Not saved — see the message above the text' },
  frozen: { dot: 'bg-quiet', text: () => 'Read-only' },
};

/** Where the text stands: a coloured dot for a glance, the words for everyone (a polite live region). */
export function SaveIndicator({ status, savedAt }: { status: SaveStatus; savedAt: Date | null }) {
  const look = LOOK[status];
  return (
    <p role="status" aria-live="polite" className="flex items-center gap-2 text-sm text-ink-soft" data-save-status={status}>
      <span aria-hidden className={`inline-block size-2 rounded-full ${look.dot}`} />
      {look.text(savedAt)}
    </p>
  );
}
