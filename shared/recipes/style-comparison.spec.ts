import { targetPosition } from './style-comparison';

describe('targetPosition', () => {
  it('counts both ends of the range as within', () => {
    expect([targetPosition(1.04, { min: 1.04, max: 1.05 }), targetPosition(1.05, { min: 1.04, max: 1.05 })]).toEqual(['within', 'within']);
  });

  it('says below and above outside the range', () => {
    expect([targetPosition(20, { min: 25, max: 40 }), targetPosition(41, { min: 25, max: 40 })]).toEqual(['below', 'above']);
  });
});
