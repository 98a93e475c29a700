/** A quiet placeholder while data arrives; announced politely to screen readers. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-10 text-center text-sm text-ink-faint">
      {label}
    </p>
  );
}
