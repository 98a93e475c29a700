import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { UNIT_INFO } from '#shared/units/units';
import { paths } from '../../../app/paths';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-error';
import { assumptionsQuery } from '../../assumptions/api/assumption-queries';
import { useAddStaffingBlock } from '../api/dataset-mutations';
import { engagementStudiesQuery } from '../api/dataset-queries';

const DAYS = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'];

/**
 * Appends a "staffing per hour" block, with the profile's hourly rates, to a draft study; the
 * service rate links an assumption of the register (or is typed in). Then the editor takes over.
 */
export function StaffingBlockForm({ datasetId, engagementId }: { datasetId: number; engagementId: number }) {
  const studies = useQuery(engagementStudiesQuery(engagementId));
  const register = useQuery(assumptionsQuery(engagementId));
  const add = useAddStaffingBlock(datasetId);
  const [studyId, setStudyId] = useState('');
  const [weekday, setWeekday] = useState('');
  const [service, setService] = useState('');
  const [rate, setRate] = useState('');
  const [level, setLevel] = useState('80');
  const [within, setWithin] = useState('15');
  const [message, setMessage] = useState<string | null>(null);
  const drafts = studies.data ?? [];
  const timed = (register.data ?? []).filter((a) => UNIT_INFO[a.unit].dimension === 'rate' || UNIT_INFO[a.unit].dimension === 'duration');

  const submit = (e: FormEvent) => {
    e.preventDefault();
    setMessage(null);
    if (!studyId) return setMessage('Choose a draft study.');
    const serviceRate = service ? { assumption: Number(service) } : Number(rate);
    if (!service && !(Number(rate) > 0)) return setMessage('Choose a service-time assumption or type the services per hour.');
    add.mutate(
      { studyId: Number(studyId), weekday: weekday === '' ? null : Number(weekday), serviceRate, criterion: 'serviceLevel', target: Number(level) / 100, t: Number(within) / 60 },
      { onError: (err) => setMessage(isApiError(err) ? err.message : 'The block was not added.') },
    );
  };

  if (add.isSuccess) {
    return (
      <Banner tone="ok" title="Staffing block added">
        <Link to={paths.study(add.data.studyId)} className="underline">
          Open the study to review it
        </Link>
      </Banner>
    );
  }
  return (
    <form onSubmit={submit} aria-label="Add an interval staffing block" className="grid gap-4 sm:grid-cols-2">
      <SelectField label="Draft study" value={studyId} onValueChange={setStudyId} options={drafts.map((s) => ({ value: String(s.id), label: s.title }))} placeholder="Choose a study" hint={drafts.length === 0 ? 'This engagement has no draft study yet.' : undefined} />
      <SelectField label="Demand of" value={weekday} onValueChange={setWeekday} options={DAYS.map((d, i) => ({ value: String(i), label: `${d}s` }))} placeholder="An average day" />
      <SelectField label="Service time or rate (from the register)" value={service} onValueChange={setService} options={timed.map((a) => ({ value: String(a.id), label: `${a.name} — ${a.value} ${UNIT_INFO[a.unit].label}` }))} placeholder="Type a rate instead" />
      {!service && <TextField label="Services per hour, one server" inputMode="decimal" value={rate} onValueChange={setRate} />}
      <TextField label="Service level target (%)" inputMode="decimal" value={level} onValueChange={setLevel} />
      <TextField label="Answered within (minutes)" inputMode="decimal" value={within} onValueChange={setWithin} />
      {message && (
        <div className="sm:col-span-2">
          <Banner tone="danger">{message}</Banner>
        </div>
      )}
      <div className="sm:col-span-2">
        <Button type="submit" variant="primary" busy={add.isPending}>
          Add the block to the study
        </Button>
      </div>
    </form>
  );
}
