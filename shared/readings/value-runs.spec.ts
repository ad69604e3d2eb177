import { addToRuns, emptyRuns, expandRuns } from './value-runs';

describe('value runs', () => {
  it('keeps a repeated value as one run and a change as a new run, nulls included', () => {
    const runs = emptyRuns<string | null>();
    for (const v of ['logger', 'logger', 'logger', null, null, 'hydrometer', 'logger']) addToRuns(runs, v);
    expect(runs).toEqual({ values: ['logger', null, 'hydrometer', 'logger'], lengths: [3, 2, 1, 1] });
    expect(expandRuns(runs)).toEqual(['logger', 'logger', 'logger', null, null, 'hydrometer', 'logger']);
  });

  it('gives back every row of ten thousand equal values from a single run, and nothing from no runs', () => {
    const runs = emptyRuns<number>();
    for (let i = 0; i < 10_000; i++) addToRuns(runs, 19.5);
    expect(runs).toEqual({ values: [19.5], lengths: [10_000] });
    expect(expandRuns(runs)).toHaveLength(10_000);
    expect(expandRuns(emptyRuns())).toEqual([]);
  });
});
