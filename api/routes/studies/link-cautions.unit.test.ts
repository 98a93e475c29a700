import { describe, expect, it } from 'vitest';
import type { FitWarning } from '../../../shared/queue/fit/index';
import { linkCautions } from './link-cautions';
import type { RegisterEntry } from './resolve-spec';

const w = (code: FitWarning['code']): FitWarning => ({ code, message: `${code} in words.` });
const register = new Map<number, RegisterEntry>([
  [1, { id: 1, name: 'Desk service time', value: 5, unit: 'minutes', version: 1, cautions: [w('not_exponential'), w('small_sample')] }],
  [2, { id: 2, name: 'Desk arrivals, average', value: 30, unit: 'per_hour', version: 1, cautions: [w('variable_demand')] }],
  [3, { id: 3, name: 'Typed in', value: 30, unit: 'per_hour', version: 1 }],
]);
const codes = (spec: Record<string, unknown>) => linkCautions(spec, register).map((c) => c.code);

describe('linkCautions', () => {
  it('repeats a rejected exponential fit only where the model assumes exponential service', () => {
    for (const model of ['M/M/1', 'M/M/c', 'M/M/c/K', 'M/M/c+M', 'staffing']) {
      expect(codes({ model, serviceRate: { assumption: 1 } })).toEqual(['data_not_exponential', 'data_small_sample']);
    }
    // Erlang B and M/M/∞ depend on the mean service time alone; M/G/1 and G/G/c take the SCV.
    for (const model of ['M/M/c/c', 'M/M/inf', 'M/G/1', 'G/G/c']) {
      expect(codes({ model, serviceRate: { assumption: 1 } })).toEqual(['data_small_sample']);
    }
  });

  it('repeats "demand varies" for a single arrival rate, not for rates given per interval', () => {
    expect(codes({ model: 'M/M/c', arrivalRate: { assumption: 2 } })).toEqual(['data_variable_demand']);
    expect(codes({ model: 'interval-staffing', arrivalRate: { assumption: 2 } })).toEqual([]);
  });

  it('names the input and the assumption, then gives the fit its own words', () => {
    expect(linkCautions({ model: 'M/M/c', serviceRate: { assumption: 1 } }, register)[0]!.message).toBe(
      'Service rate μ per server is linked to "Desk service time", fitted from data: not_exponential in words.',
    );
  });

  it('says nothing for plain numbers, values without cautions and links to missing assumptions', () => {
    expect(codes({ model: 'M/M/c', arrivalRate: 30, serviceRate: 12 })).toEqual([]);
    expect(codes({ model: 'M/M/c', arrivalRate: { assumption: 3 }, serviceRate: { assumption: 99 } })).toEqual([]);
  });
});
