import { hopTimeProblem, hopTimingText } from './hop-timing';

describe('hopTimeProblem', () => {
  it('refuses a boil addition longer than the boil', () => {
    expect(hopTimeProblem({ use: 'boil', time: 90 }, 60)).toBe('must be at most the boil time, 60 min');
  });

  it('accepts a boil addition for the whole boil', () => {
    expect(hopTimeProblem({ use: 'boil', time: 60 }, 60)).toBeNull();
  });

  it('leaves whirlpool and dry-hop times to their own units', () => {
    expect(hopTimeProblem({ use: 'whirlpool', time: 90 }, 60)).toBeNull();
    expect(hopTimeProblem({ use: 'dry hop', time: 90 }, 60)).toBeNull();
  });
});

describe('hopTimingText', () => {
  it('says how long dry hops stay in, the same wherever it is read', () => {
    expect(hopTimingText('dry hop', 3)).toBe('Dry hop, 3 days before packaging');
  });

  it('counts boil additions down to the end of the boil', () => {
    expect(hopTimingText('boil', 10)).toBe('10 min before the end of the boil');
    expect(hopTimingText('boil', 0)).toBe('Flame-out');
  });
});
