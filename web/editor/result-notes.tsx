interface Method {
  name: string;
  exact: boolean;
  reference?: string;
  note?: string;
}

interface Warning {
  code: string;
  message: string;
}

/** Reads a result's method, if it names one. */
export function methodOf(result: Record<string, unknown> | null): Method | null {
  const m = result?.method as Partial<Method> | undefined;
  return m && typeof m.name === 'string' ? { name: m.name, exact: m.exact === true, reference: m.reference, note: m.note } : null;
}

/** Reads a result's warnings (already written as sentences by the engine). */
export function warningsOf(result: Record<string, unknown> | null): Warning[] {
  const w = result?.warnings;
  return Array.isArray(w) ? (w as Warning[]).filter((x) => typeof x?.message === 'string') : [];
}

/** The method's name, whether it is exact, and the cautions, in plain sentences under the table. */
export function ResultNotes({ method, warnings }: { method: Method | null; warnings: readonly { label?: string; message: string }[] }) {
  return (
    <div className="mt-3 space-y-2 font-sans text-sm">
      {method && (
        <p className="text-ink-soft">
          <span className="font-medium text-ink">Method:</span> {method.name} —{' '}
          <span className={method.exact ? 'text-ok' : 'text-warn'}>{method.exact ? 'exact' : 'approximation'}</span>
          {method.note && <span>. {method.note}</span>}
        </p>
      )}
      {warnings.length > 0 && (
        <ul aria-label="Cautions for this block" className="space-y-1 border-l-2 border-warn pl-3 text-ink">
          {warnings.map((w, i) => (
            <li key={i}>
              {w.label && <span className="font-medium">{w.label}: </span>}
              {w.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
