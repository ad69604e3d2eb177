import { correctedGravity, RawGravity } from './corrected-gravity';

const raw = (r: Partial<RawGravity> & Pick<RawGravity, 'instrument' | 'rawValue' | 'rawUnit'>): RawGravity => ({
  sampleTemperatureC: null,
  calibrationTemperatureC: null,
  ...r,
});
const beforePitch = { wortCorrectionFactor: 1.04, originalBrix: null };

describe('correctedGravity', () => {
  it('when a 20 °C hydrometer reads 1.050 in a 30 °C sample, then it adds the water-density ratio', () => {
    // Density of water 998.2067 kg/m³ at 20 °C and 995.6488 at 30 °C (Tanaka et al. 2001, Metrologia 38, Table 1):
    // 1.050 × 998.2067 / 995.6488 = 1.052697.
    const result = correctedGravity(raw({ instrument: 'hydrometer', rawValue: 1.05, rawUnit: 'sg', sampleTemperatureC: 30, calibrationTemperatureC: 20 }), beforePitch);
    expect(result.correctedSg).toBeCloseTo(1.052697, 5);
    expect(result.calibrationTemperatureC).toBe(20);
  });

  it('when a hydrometer reads 12 °P at its calibration temperature, then it stores SG 1.0484', () => {
    // ASBC extract table (sucrose): 12.0 °P ↔ SG 20/20 1.04837 (from memory).
    const result = correctedGravity(raw({ instrument: 'hydrometer', rawValue: 12, rawUnit: 'plato', sampleTemperatureC: 20 }), beforePitch);
    expect(result.correctedSg).toBeCloseTo(1.04837, 4);
  });

  it('when a refractometer reads unfermented wort, then °Bx over the factor 1.04 gives the gravity', () => {
    // 12.48 °Bx / 1.04 = 12.0 °P, SG 1.04837 by the ASBC table (from memory); 1.04 is common practice.
    const result = correctedGravity(raw({ instrument: 'refractometer', rawValue: 12.48, rawUnit: 'brix' }), beforePitch);
    expect(result.correctedSg).toBeCloseTo(1.04837, 4);
    expect(result.correctionFactor).toBe(1.04);
    expect(result.originalBrix).toBeNull();
  });

  it('when a refractometer reads fermenting beer, then the alcohol correction applies with the original °Bx', () => {
    // Terrill's cubic (2011), hand-worked at corrected OB 20, FB 10: SG 1.015961.
    const result = correctedGravity(raw({ instrument: 'refractometer', rawValue: 10.4, rawUnit: 'brix' }), { wortCorrectionFactor: 1.04, originalBrix: 20.8 });
    expect(result.correctedSg).toBeCloseTo(1.015961, 6);
    expect(result.originalBrix).toBe(20.8);
  });

  it('when a density meter reads 1048.4 kg/m³ at 20 °C, then SG 20/20 is that over water at 20 °C', () => {
    // Water at 20 °C: 998.2067 kg/m³ (Tanaka et al. 2001): 1048.4 / 998.2067 = 1.050283.
    const result = correctedGravity(raw({ instrument: 'density-meter', rawValue: 1048.4, rawUnit: 'kg-m3', sampleTemperatureC: 20 }), beforePitch);
    expect(result.correctedSg).toBeCloseTo(1.050283, 6);
  });

  it('when a logger reports SG, then it is stored as reported (the device compensates temperature)', () => {
    const result = correctedGravity(raw({ instrument: 'logger', rawValue: 1.012, rawUnit: 'sg', sampleTemperatureC: 18 }), beforePitch);
    expect(result.correctedSg).toBe(1.012);
  });
});
