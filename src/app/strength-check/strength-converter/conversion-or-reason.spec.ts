import { conversionOrReason } from './conversion-or-reason';

describe('conversionOrReason', () => {
  it('converts complete inputs', () => {
    const outcome = conversionOrReason('percentVolume20', 40, 20);
    // OIML R 22 at 20 °C (from memory): 40 % vol ≙ 33.30 % mass.
    expect(outcome.conversion?.massPercent).toBeCloseTo(33.3, 1);
  });

  it('asks for missing inputs', () => {
    expect(conversionOrReason('massPercent', null, 20).reason).toBe('Enter a value and a temperature.');
  });

  it('names the range of a value out of range', () => {
    expect(conversionOrReason('moleFraction', 2, 20).reason).toBe('Mole fraction of ethanol must be from 0 to 1.');
  });

  it('explains a temperature the equation does not cover', () => {
    expect(conversionOrReason('massPercent', 10, 60).reason).toMatch(/^Out of range: temperature/);
  });
});
