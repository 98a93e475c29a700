import type { DatasetStatus } from '#shared/schemas/datasets';

/** What each state means to the person looking at the list. */
export const STATUS_WORDS: Record<DatasetStatus, { label: string; tone: 'quiet' | 'info' | 'ok' | 'danger' }> = {
  uploaded: { label: 'Needs column mapping', tone: 'quiet' },
  mapped: { label: 'Waiting to fit', tone: 'info' },
  fitting: { label: 'Fitting', tone: 'info' },
  fitted: { label: 'Fitted', tone: 'ok' },
  failed: { label: 'Could not fit', tone: 'danger' },
};
