import { hydrometerStrengthUncertainty, strengthBreakdown } from '../science';
import { batchStrengthFigures, declaredStrengthVerdict } from './batch-strength';

const hydrometer = (sg: number) => ({ sg, resolutionSg: 0.001 });

describe('batchStrengthFigures', () => {
  it('gives the same steps and % vol as the science library for the same OG and FG', () => {
    const figures = batchStrengthFigures(hydrometer(1.05), hydrometer(1.01));
    const library = strengthBreakdown(1.05, 1.01);

    expect(figures.steps.map((s) => s.value)).toEqual([
      library.originalExtract, library.apparentExtract, library.realExtract, library.alcoholByMass,
      library.beerDensity20, library.ethanolDensity20, library.percentVolume20,
    ]);
    expect(figures.densityBased.value).toBe(library.percentVolume20);
    expect(figures.linearEstimate.value).toBe(library.linearEstimate);
    expect(figures.nonLinearEstimate.value).toBe(library.nonLinearEstimate);
  });

  // By hand: the 131.25 rule with two readings each u = 0.001/√12 gives 131.25 × √2 × 0.000289 = 0.0536 % vol.
  it('propagates two hydrometer resolutions into the linear estimate as the library does', () => {
    const figures = batchStrengthFigures(hydrometer(1.05), hydrometer(1.01));
    expect(figures.linearEstimate.standardUncertainty).toBeCloseTo(131.25 * Math.SQRT2 * 0.001 / Math.sqrt(12), 4);
    // At the calibration temperature the library's hydrometer figure adds only the thermometer's small share.
    const library = hydrometerStrengthUncertainty({ ogReading: 1.05, fgReading: 1.01, thermometerResolution: 1e-9 });
    expect(figures.densityBased.standardUncertainty).toBeCloseTo(library.densityBased.standardUncertainty, 6);
  });

  it('shrinks with a density meter for the final gravity', () => {
    const coarse = batchStrengthFigures(hydrometer(1.05), hydrometer(1.01));
    const fine = batchStrengthFigures(hydrometer(1.05), { sg: 1.01, resolutionSg: 0.0001 });
    expect(fine.densityBased.expandedUncertainty).toBeLessThan(coarse.densityBased.expandedUncertainty);
  });
});

describe('declaredStrengthVerdict', () => {
  const figures = batchStrengthFigures(hydrometer(1.05), hydrometer(1.01));
  const beer = { name: 'Beer', tolerancePercentVolume: 0.5 };

  it('says within when the declared figure is close to the density-based one', () => {
    expect(declaredStrengthVerdict(figures, Math.round(figures.densityBased.value * 10) / 10, beer).verdict).toBe('within');
  });

  it('says outside when it is far off and undecided at the edge', () => {
    expect(declaredStrengthVerdict(figures, figures.densityBased.value + 1, beer).verdict).toBe('outside');
    expect(declaredStrengthVerdict(figures, figures.densityBased.value + 0.5, beer).verdict).toBe('undecided');
  });
});
