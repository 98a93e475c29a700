import { useState, type FormEvent } from 'react';
import { DATASET_INTERVALS, type Dataset, type DatasetMapping } from '#shared/schemas/datasets';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-error';
import { useSaveMapping } from '../api/dataset-mutations';
import { guessMapping } from '../lib/guess-mapping';
import { PreviewTable } from './preview-table';

const opt = (value: string, label: string) => ({ value, label });
const KINDS = [opt('event_log', 'Event log — one row per arrival'), opt('interval_counts', 'Interval counts — arrivals per interval')];
const DELIMS = [opt('comma', 'Comma ( , )'), opt('tab', 'Tab'), opt('semicolon', 'Semicolon ( ; )'), opt('pipe', 'Vertical bar ( | )')];
const FORMATS = [opt('iso8601', 'ISO 8601 (2026-03-02T08:15:00)'), opt('epoch_seconds', 'Seconds since 1970'), opt('epoch_milliseconds', 'Milliseconds since 1970')];
const ZONES = ['UTC', 'Europe/London', 'Europe/Paris', 'Europe/Berlin', 'America/New_York', 'America/Chicago', 'America/Los_Angeles', 'Asia/Tokyo', 'Australia/Sydney'];

/** Which column means what, how to read times, and the interval of the profile; then fit. */
export function MappingForm({ dataset, onSaved }: { dataset: Dataset; onSaved?: () => void }) {
  const [m, setM] = useState<DatasetMapping>(() => guessMapping(dataset));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);
  const save = useSaveMapping(dataset.id);
  const set = <K extends keyof DatasetMapping>(k: K, v: DatasetMapping[K]) => setM((old) => ({ ...old, [k]: v }));
  const columns = dataset.header.map((h) => opt(h, h));
  const optional = (k: 'serviceStartColumn' | 'serviceEndColumn' | 'channelColumn' | 'countColumn' | 'handlingTimeColumn', label: string, hint?: string) => (
    <SelectField label={label} hint={hint} value={m[k] ?? ''} onValueChange={(v) => set(k, v || null)} options={columns} placeholder="(none)" error={errors[k]} />
  );
  const zones = ZONES.includes(m.timeZone) ? ZONES : [m.timeZone, ...ZONES];

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setErrors({});
    setMessage(null);
    save.mutate(m, {
      onSuccess: () => onSaved?.(),
      onError: (err) => {
        if (!isApiError(err)) return setMessage('The mapping could not be saved.');
        setErrors(Object.fromEntries(err.issues.map((i) => [i.path, i.message])));
        setMessage(err.message);
      },
    });
  };

  const used = new Set([m.timeColumn, m.serviceStartColumn, m.serviceEndColumn, m.channelColumn, m.countColumn, m.handlingTimeColumn].filter((c): c is string => !!c));
  return (
    <form onSubmit={submit} className="flex flex-col gap-6" aria-label="Column mapping">
      {dataset.problem && dataset.status === 'failed' && (
        <Banner tone="danger" title="The last fit stopped">
          {dataset.problem.message} Fix the mapping (or the file) and fit again.
        </Banner>
      )}
      <PreviewTable header={dataset.header} rows={dataset.preview} highlighted={used} />
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        <SelectField label="The file holds" value={m.kind} onValueChange={(v) => set('kind', v as DatasetMapping['kind'])} options={KINDS} error={errors.kind} />
        <SelectField label="Delimiter" hint={`Detected: ${dataset.detectedDelimiter}`} value={m.delimiter} onValueChange={(v) => set('delimiter', v as DatasetMapping['delimiter'])} options={DELIMS} error={errors.delimiter} />
        <SelectField label="Timestamps" value={m.timestampFormat} onValueChange={(v) => set('timestampFormat', v as DatasetMapping['timestampFormat'])} options={FORMATS} error={errors.timestampFormat} />
        <SelectField label="Time zone" hint="Times without an offset are read in it; hours of the day follow its clock." value={m.timeZone} onValueChange={(v) => set('timeZone', v)} options={zones.map((z) => opt(z, z))} error={errors.timeZone} />
        <SelectField label="Interval" value={String(m.intervalMinutes)} onValueChange={(v) => set('intervalMinutes', Number(v) as DatasetMapping['intervalMinutes'])} options={DATASET_INTERVALS.map((n) => opt(String(n), `${n} minutes`))} error={errors.intervalMinutes} />
        <SelectField label={m.kind === 'event_log' ? 'Arrival time' : 'Interval start'} value={m.timeColumn} onValueChange={(v) => set('timeColumn', v)} options={columns} error={errors.timeColumn} />
        {m.kind === 'event_log' ? (
          <>
            {optional('serviceStartColumn', 'Service start', 'With service end, gives the service time.')}
            {optional('serviceEndColumn', 'Service end')}
            {optional('channelColumn', 'Channel or queue')}
          </>
        ) : (
          <>
            {optional('countColumn', 'Count of arrivals')}
            {optional('handlingTimeColumn', 'Mean handling time')}
            <SelectField label="Handling time in" value={m.handlingTimeUnit} onValueChange={(v) => set('handlingTimeUnit', v as DatasetMapping['handlingTimeUnit'])} options={[opt('seconds', 'seconds'), opt('minutes', 'minutes')]} />
          </>
        )}
      </div>
      {!ZONES.includes(m.timeZone) && <TextField label="Other time zone (IANA name)" value={m.timeZone} onValueChange={(v) => set('timeZone', v)} />}
      {message && (
        <Banner tone="danger" title="Not saved">
          {message}
        </Banner>
      )}
      <div>
        <Button type="submit" variant="primary" busy={save.isPending}>
          Save mapping and fit
        </Button>
      </div>
    </form>
  );
}
