import { describe, expect, it } from 'vitest';
import { QueueError } from '../errors';
import { expectRel } from '../testing/expect-close';
import { jackson } from './jackson';
import { mmc } from './mmc';

describe('open Jackson network', () => {
  it('reduces to independent M/M/c nodes in tandem', () => {
    const r = jackson({ externalArrivalRates: [4, 0], routing: [[0, 1], [0, 0]], serviceRates: [5, 3], servers: [1, 2] });
    const a = mmc({ arrivalRate: 4, serviceRate: 5, servers: 1 });
    const b = mmc({ arrivalRate: 4, serviceRate: 3, servers: 2 });
    expect(r.nodeArrivalRates).toEqual([4, 4]);
    expectRel(r.L, (a.L as number) + (b.L as number), 1e-14);
    expectRel(r.W, (a.W as number) + (b.W as number), 1e-14);
  });

  it('solves feedback: λ = γ/(1 − p) for a node that sends p back to itself', () => {
    const r = jackson({ externalArrivalRates: [1], routing: [[0.75]], serviceRates: [5], servers: [1] });
    expectRel(r.nodeArrivalRates?.[0], 4, 1e-14);
    expectRel(r.W, (r.L as number) / 1, 1e-14);
  });

  it('refuses a network customers can never leave', () => {
    try {
      jackson({ externalArrivalRates: [1, 0], routing: [[0, 1], [1, 0]], serviceRates: [5, 5], servers: [1, 1] });
      expect.unreachable();
    } catch (err) {
      expect((err as QueueError).code).toBe('invalid_input');
      expect((err as QueueError).issues[0].path).toBe('routing');
    }
  });

  it('names the unstable node', () => {
    try {
      jackson({ externalArrivalRates: [1, 0], routing: [[0, 0.9], [0.5, 0]], serviceRates: [5, 1], servers: [1, 1] });
      expect.unreachable();
    } catch (err) {
      const e = err as QueueError;
      expect(e.code).toBe('unstable');
      expect(e.issues[0].path).toBe('servers.1');
      expect(e.details?.node).toBe(1);
    }
  });
});
