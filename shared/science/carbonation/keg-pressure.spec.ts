import { kegPressure } from './keg-pressure';

describe('kegPressure', () => {
  // Common-practice carbonation charts, from memory: 2.5 volumes at 38 °F sits at about 11–12 psi.
  it('gives about 10–13 psi for 2.5 volumes at 38 °F (3.3 °C)', () => {
    const setting = kegPressure(2.5, (38 - 32) / 1.8);
    expect(setting.gaugePsi).toBeGreaterThan(10);
    expect(setting.gaugePsi).toBeLessThan(13);
    expect(setting.aboveCommonKegRelief).toBe(false);
  });

  it('flags a warm, highly carbonated target above the common relief setting', () => {
    expect(kegPressure(4.5, 20).aboveCommonKegRelief).toBe(true);
  });

  it('throws for a serving temperature above 30 °C', () => {
    expect(() => kegPressure(2.5, 35)).toThrow(/servingTemperature = 35 °C/);
  });
});
