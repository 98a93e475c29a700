import type { AuditEntry } from '#shared/schemas/audit';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDate } from '../../../lib/format-date';
import { auditActionLabel } from './audit-action-labels';

/** Details are free-form; show them as short key: value pairs rather than raw JSON. */
function describeDetail(detail: AuditEntry['detail']): string {
  if (!detail) return '';
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${typeof v === 'string' ? v : JSON.stringify(v)}`)
    .join(' · ');
}

export function AuditTable({ entries }: { entries: AuditEntry[] }) {
  return (
    <Table caption="Audit trail entries, newest first">
      <thead>
        <tr>
          <Th>When</Th>
          <Th>Event</Th>
          <Th>Person</Th>
          <Th>Engagement</Th>
          <Th>Subject and details</Th>
          <Th>From address</Th>
        </tr>
      </thead>
      <tbody>
        {entries.map((e) => (
          <tr key={e.id}>
            <Td className="whitespace-nowrap tabular-nums text-ink-soft">
              <time dateTime={e.at}>{formatDate(e.at)}</time>
            </Td>
            <Td className="font-medium whitespace-nowrap">{auditActionLabel(e.action)}</Td>
            <Td className="break-all">{e.actorEmail ?? <span className="text-ink-faint">—</span>}</Td>
            <Td>{e.engagementName ?? <span className="text-ink-faint">—</span>}</Td>
            <Td className="max-w-md">
              {e.subject && <span className="block">{e.subject}</span>}
              {e.detail && <span className="block text-xs break-words text-ink-faint">{describeDetail(e.detail)}</span>}
            </Td>
            <Td className="whitespace-nowrap text-ink-faint tabular-nums">{e.ip ?? ''}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
