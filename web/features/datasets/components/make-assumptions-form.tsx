import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { UNIT_CODES, UNIT_INFO, type UnitCode } from '#shared/units/units';
import type { AssumptionSuggestion } from '#shared/schemas/datasets';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-error';
import { useCreateDatasetAssumptions } from '../api/dataset-mutations';

interface Row extends AssumptionSuggestion {
  chosen: boolean;
  text: string;
}

/** The fitted values as editable rows; the chosen ones go to the register with the dataset as source. */
export function MakeAssumptionsForm({ datasetId, engagementId, suggestions }: { datasetId: number; engagementId: number; suggestions: AssumptionSuggestion[] }) {
  const [rows, setRows] = useState<Row[]>(() => suggestions.map((s) => ({ ...s, chosen: true, text: String(s.value) })));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const create = useCreateDatasetAssumptions(datasetId, engagementId);
  const edit = (i: number, patch: Partial<Row>) => setRows((old) => old.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const chosen = rows.map((r, i) => ({ r, i })).filter(({ r }) => r.chosen);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setErrors({});
    setMessage(null);
    const body = { assumptions: chosen.map(({ r }) => ({ key: r.key, name: r.name, value: Number(r.text), unit: r.unit, notes: r.notes })) };
    create.mutate(body, {
      onError: (err) => {
        if (!isApiError(err)) return setMessage('Not saved.');
        // Issues name rows of the request ("assumptions.0.name"): map back to the form's rows.
        setErrors(Object.fromEntries(err.issues.map((iss) => [iss.path.replace(/^assumptions\.(\d+)/, (_m, k: string) => `rows.${chosen[Number(k)]?.i}`), iss.message])));
        setMessage(err.message);
      },
    });
  };

  if (create.isSuccess) {
    return (
      <Banner tone="ok" title={`${create.data.length} assumption${create.data.length === 1 ? '' : 's'} added to the register`}>
        <Link to={paths.assumptions(engagementId)} className="underline">
          Open the assumption register
        </Link>
      </Banner>
    );
  }
  return (
    <form onSubmit={submit} aria-label="Make assumptions" className="flex flex-col gap-3">
      <table className="w-full text-sm">
        <thead className="text-left text-ink-faint">
          <tr>
            <th className="w-10 py-1 font-medium">Use</th>
            <th className="py-1 font-medium">Name</th>
            <th className="w-32 py-1 font-medium">Value</th>
            <th className="w-44 py-1 font-medium">Unit</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={r.key} className="border-t border-rule align-top">
              <td className="py-2">
                <input type="checkbox" aria-label={`Use ${r.name}`} checked={r.chosen} onChange={(e) => edit(i, { chosen: e.target.checked })} />
              </td>
              <td className="py-2 pr-2">
                <input aria-label="Name" value={r.name} onChange={(e) => edit(i, { name: e.target.value })} className="w-full rounded border border-rule-strong px-2 py-1" />
                {errors[`rows.${i}.name`] && <p className="text-xs text-danger">{errors[`rows.${i}.name`]}</p>}
                <p className="mt-1 text-xs text-ink-faint">{r.notes}</p>
              </td>
              <td className="py-2 pr-2">
                <input aria-label="Value" inputMode="decimal" value={r.text} onChange={(e) => edit(i, { text: e.target.value })} className="w-full rounded border border-rule-strong px-2 py-1 text-right tabular-nums" />
                {errors[`rows.${i}.value`] && <p className="text-xs text-danger">{errors[`rows.${i}.value`]}</p>}
              </td>
              <td className="py-2">
                <select aria-label="Unit" value={r.unit} onChange={(e) => edit(i, { unit: e.target.value as UnitCode })} className="w-full rounded border border-rule-strong px-2 py-1">
                  {UNIT_CODES.map((u) => (
                    <option key={u} value={u}>
                      {UNIT_INFO[u].label}
                    </option>
                  ))}
                </select>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {message && <Banner tone="danger">{message}</Banner>}
      <div>
        <Button type="submit" variant="primary" busy={create.isPending} disabled={chosen.length === 0}>
          Add {chosen.length} to the register
        </Button>
      </div>
    </form>
  );
}
