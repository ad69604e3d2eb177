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
