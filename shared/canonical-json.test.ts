import { describe, expect, it } from 'vitest';
import { canonicalJson } from './canonical-json';

describe('canonicalJson', () => {
  it('sorts keys at every depth and leaves out whitespace', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: true, y: null }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}');
  });
  it('gives the same string whatever the key order', () => {
    expect(canonicalJson({ x: 1, y: { p: 2, q: 3 } })).toBe(canonicalJson({ y: { q: 3, p: 2 }, x: 1 }));
  });
  it('keeps array order (order is content)', () => {
    expect(canonicalJson([2, 1])).not.toBe(canonicalJson([1, 2]));
  });
  it('drops undefined members and writes undefined array items as null, as JSON.stringify does', () => {
    expect(canonicalJson({ a: undefined, b: [undefined] })).toBe(JSON.stringify({ b: [null] }));
  });
  it('escapes strings as JSON does (source: ECMA-404 string grammar)', () => {
    expect(canonicalJson({ 'k"': 'line\nbreak é' })).toBe('{"k\\"":"line\\nbreak é"}');
  });
  it('survives a JSON round trip unchanged', () => {
    const v = { n: 0.1 + 0.2, big: 1e300, neg: -5e-324, s: 'ρ ≥ 1' };
    expect(canonicalJson(JSON.parse(JSON.stringify(v)))).toBe(canonicalJson(v));
  });
  it('refuses values without a JSON form', () => {
    expect(() => canonicalJson({ a: Number.NaN })).toThrow(TypeError);
    expect(() => canonicalJson(Infinity)).toThrow(TypeError);
  });
});
