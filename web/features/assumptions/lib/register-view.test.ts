import { describe, expect, it } from 'vitest';
import type { Assumption } from '#shared/schemas/assumptions';
import { NO_FILTER, registerView } from './register-view';

const row = (over: Partial<Assumption>): Assumption => ({
  id: 1,
  engagementId: 1,
  name: 'x',
  value: 1,
  unit: 'count',
  sourceKind: 'client',
  sourceDetail: '',
  ownerId: null,
  ownerName: null,
  notes: '',
  cautions: [],
  usageCount: 0,
  updatedAt: '2030-01-01T00:00:00.000Z',
  version: 1,
  ...over,
});

const rows = [
  row({ id: 1, name: 'Peak arrivals', value: 140, unit: 'per_hour', sourceKind: 'dataset', usageCount: 3, ownerName: 'Rhea Okafor' }),
  row({ id: 2, name: 'handling time', value: 4.5, unit: 'minutes', sourceKind: 'judgement', sourceDetail: 'workshop notes' }),
  row({ id: 3, name: 'Desks open', value: 12, usageCount: 1 }),
];
const names = (list: Assumption[]) => list.map((a) => a.name);

describe('registerView', () => {
  it('sorts names alphabetically regardless of case', () => {
    expect(names(registerView(rows, NO_FILTER, { key: 'name', direction: 'asc' }))).toEqual(['Desks open', 'handling time', 'Peak arrivals']);
  });

  it('sorts values as numbers, largest first when descending', () => {
    expect(names(registerView(rows, NO_FILTER, { key: 'value', direction: 'desc' }))).toEqual(['Peak arrivals', 'Desks open', 'handling time']);
  });

  it('keeps only assumptions in use, or only unused ones', () => {
    expect(names(registerView(rows, { ...NO_FILTER, usage: 'used' }, { key: 'usage', direction: 'desc' }))).toEqual(['Peak arrivals', 'Desks open']);
    expect(names(registerView(rows, { ...NO_FILTER, usage: 'unused' }, { key: 'name', direction: 'asc' }))).toEqual(['handling time']);
  });

  it('finds text in the source detail and the owner', () => {
    expect(names(registerView(rows, { ...NO_FILTER, text: 'WORKSHOP' }, { key: 'name', direction: 'asc' }))).toEqual(['handling time']);
    expect(names(registerView(rows, { ...NO_FILTER, text: 'okafor' }, { key: 'name', direction: 'asc' }))).toEqual(['Peak arrivals']);
  });

  it('filters by source', () => {
    expect(names(registerView(rows, { ...NO_FILTER, source: 'client' }, { key: 'name', direction: 'asc' }))).toEqual(['Desks open']);
  });
});
