import fc from 'fast-check';
import * as science from '../index';
import { CatalogueLookupError, FUNCTION_CATALOGUE, describeCatalogue, evaluateByName } from './function-catalogue';
import { ScienceRangeError } from '../units/science-range-error';

describe('FUNCTION_CATALOGUE', () => {
  it('names each function once', () => {
    const names = FUNCTION_CATALOGUE.map((e) => e.name);
    expect(new Set(names).size).toBe(names.length);
  });

  it('names only functions that the public entry exports, with as many parameters', () => {
    for (const entry of FUNCTION_CATALOGUE) {
      const fn = (science as Record<string, unknown>)[entry.name];
      expect(typeof fn).toBe('function');
      expect(entry.parameters.length).toBeGreaterThanOrEqual((fn as (...a: unknown[]) => unknown).length);
    }
  });

  it('gives every parameter a unit field and a kind', () => {
    for (const p of describeCatalogue().flatMap((e) => e.parameters)) {
      expect(typeof p.unit).toBe('string');
      expect(['number', 'json', 'text']).toContain(p.kind);
    }
  });
});

describe('evaluateByName', () => {
  it('calls the named function with named arguments', () => {
    expect(evaluateByName('sgFromPlato', { plato: 0 })).toBeCloseTo(science.sgFromPlato(0), 15);
  });

  it('throws a CatalogueLookupError for an unknown name', () => {
    expect(() => evaluateByName('nothing', {})).toThrow(CatalogueLookupError);
  });

  it('throws a ScienceRangeError naming a missing parameter', () => {
    expect(() => evaluateByName('waterDensity', {})).toThrow(ScienceRangeError);
  });
});

describe('catalogue coverage', () => {
  const catalogueOwn = new Set(['describeCatalogue', 'evaluateByName']);

  it('lists every function the public entry exports', () => {
    const listed = new Set(FUNCTION_CATALOGUE.map((e) => e.name));
    const exported = Object.entries(science)
      .filter(([name, value]) => typeof value === 'function' && !/^[A-Z]/.test(name) && !catalogueOwn.has(name))
      .map(([name]) => name);
    expect(exported.filter((name) => !listed.has(name))).toEqual([]);
  });
});

function hasNaN(value: unknown): boolean {
  if (typeof value === 'number') return Number.isNaN(value);
  if (Array.isArray(value)) return value.some(hasNaN);
  if (value && typeof value === 'object') return Object.values(value).some(hasNaN);
  return false;
}

describe('no NaN out', () => {
  // Random inputs, in and far out of range: each function either refuses with a ScienceRangeError or
  // returns a result with no NaN anywhere in it.
  const number = fc.oneof(
    fc.double({ noDefaultInfinity: false }), fc.double({ min: -5, max: 5, noNaN: true }),
    fc.double({ min: 0.98, max: 1.2, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), fc.constant(Number.NaN),
  );

  it.each(FUNCTION_CATALOGUE.map((e) => [e.name, e] as const))('%s never returns NaN', (_, entry) => {
    fc.assert(fc.property(fc.array(number, { minLength: entry.parameters.length, maxLength: entry.parameters.length }), (values) => {
      const args: Record<string, unknown> = {};
      entry.parameters.forEach((p, i) => {
        if (p.kind === 'number') args[p.name] = values[i];
        if (p.kind === 'json') args[p.name] = [];
      });
      try {
        return !hasNaN(entry.call(args));
      } catch (error) {
        return error instanceof ScienceRangeError;
      }
    }), { numRuns: 300 });
  });
});
