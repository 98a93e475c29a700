import { ASSUMPTION_SOURCES } from '#shared/schemas/assumptions';

type Source = (typeof ASSUMPTION_SOURCES)[number];

/** Where a value comes from, as the register and the report's appendix say it. */
export const SOURCE_LABELS: Record<Source, string> = {
  dataset: 'Fitted from a dataset',
  client: 'Stated by the client',
  judgement: 'Consultant judgement',
  published: 'Published figure',
  other: 'Other',
};

export const SOURCE_OPTIONS = ASSUMPTION_SOURCES.map((s) => ({ value: s, label: SOURCE_LABELS[s] }));
