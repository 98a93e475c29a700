import { MODEL_CATALOG, type MeasureField } from '#shared/queue/catalog';

/** Every measure name the engine reports, with its label and kind (first model that names it wins). */
const INFO = new Map<string, MeasureField>();
for (const entry of MODEL_CATALOG) for (const m of entry.measures) if (!INFO.has(m.name)) INFO.set(m.name, m);

/** A measure name from a moved-numbers answer: "Wq", or "Option B: Wq" for a scenario's. */
export function measureInfo(measure: string): { scenario: string | null; label: string; kind: MeasureField['kind'] | null; name: string } {
  const at = measure.lastIndexOf(': ');
  const scenario = at === -1 ? null : measure.slice(0, at);
  const name = at === -1 ? measure : measure.slice(at + 2);
  const field = INFO.get(name);
  return { scenario, name, label: field?.label ?? name, kind: field?.kind ?? null };
}
