import {
  abvLinearEstimate,
  bitternessRatio,
  brewhouseVolumes,
  densityBasedAbv,
  finalGravityFromAttenuation,
  moreyColourMetric,
  originalGravityMetric,
  strengthBreakdown,
  strikeWaterTemperature,
  tinsethIbu,
  usGallonsToLitres,
  poundsToKilograms,
} from '@shared/science';
import { compareToStyle, predictRecipe } from './recipe-prediction';
import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE } from './recipe-test-data';
import { StyleTarget } from './style-target';

const catalogue = generateMockCatalogue();

describe('predictRecipe', () => {
  it('takes OG from originalGravityMetric with each grain yield times the mash efficiency', () => {
    const design = generateMockDesign();

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    const expected = originalGravityMetric([{ kilograms: 4.2, extractYieldPercent: 80 * 0.72 }, { kilograms: 0.3, extractYieldPercent: 74 * 0.72 }], 100, 20);
    expect(prediction.og).toBeCloseTo(expected, 12);
    expect(prediction.og).toBeCloseTo(originalGravityMetric([{ kilograms: 4.2, extractYieldPercent: 80 }, { kilograms: 0.3, extractYieldPercent: 74 }], 72, 20), 12);
  });

  it('does not apply the mash efficiency to sugar, which is not mashed', () => {
    const design = generateMockDesign({ fermentables: [{ fermentableId: 1, amountKg: 4 }, { fermentableId: 3, amountKg: 0.5 }] });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    const expected = originalGravityMetric([{ kilograms: 4, extractYieldPercent: 80 * 0.72 }, { kilograms: 0.5, extractYieldPercent: 100 }], 100, 20);
    expect(prediction.og).toBeCloseTo(expected, 12);
  });

  it('takes FG from the middle of the yeast attenuation range, and both ABV figures from the strength library', () => {
    const prediction = predictRecipe(generateMockDesign(), catalogue, MOCK_BREWHOUSE);
    const og = prediction.og!;

    const fg = finalGravityFromAttenuation(og, 75);
    expect(prediction.fg).toBeCloseTo(fg, 12);
    expect(prediction.abvEstimate).toBeCloseTo(abvLinearEstimate(og, fg), 12);
    expect(prediction.abvDensityBased).toBeCloseTo(densityBasedAbv(og, fg), 12);
    expect(prediction.strength).toEqual(strengthBreakdown(og, fg));
  });

  it('gives each hop addition its Tinseth IBU at the OG and batch volume; dry hops add none', () => {
    const prediction = predictRecipe(generateMockDesign(), catalogue, MOCK_BREWHOUSE);
    const og = prediction.og!;

    const bittering = tinsethIbu({ grams: 20, alphaPercent: 12, minutes: 60 }, og, 20);
    const aroma = tinsethIbu({ grams: 30, alphaPercent: 4.5, minutes: 10 }, og, 20);
    expect(prediction.hopBitterness.map((hop) => hop.ibu)).toEqual([bittering, aroma, 0]);
    expect(prediction.ibu).toBeCloseTo(bittering + aroma, 12);
    expect(prediction.buGu).toBeCloseTo(bitternessRatio(bittering + aroma, og), 12);
  });

  it('counts a first-wort addition for the whole boil', () => {
    const design = generateMockDesign({ boilMinutes: 75, hops: [{ hopId: 11, amountGrams: 15, time: 0, use: 'first wort' }] });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    expect(prediction.ibu).toBeCloseTo(tinsethIbu({ grams: 15, alphaPercent: 12, minutes: 75 }, prediction.og!, 20), 12);
  });

  it('takes colour from moreyColourMetric, SRM and EBC', () => {
    const prediction = predictRecipe(generateMockDesign(), catalogue, MOCK_BREWHOUSE);

    const colour = moreyColourMetric([{ kilograms: 4.2, lovibond: 3 }, { kilograms: 0.3, lovibond: 60 }], 20);
    expect(prediction.colourSrm).toBeCloseTo(colour.srm, 12);
    expect(prediction.colourEbc).toBeCloseTo(colour.ebc, 12);
  });

  it('worked example (Morey\'s equation, common practice): 10 lb of 3 °L malt in 5 US gal is MCU 6, about 5.1 SRM', () => {
    const design = generateMockDesign({
      batchVolumeLitres: usGallonsToLitres(5),
      fermentables: [{ fermentableId: 1, amountKg: poundsToKilograms(10) }],
    });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    // 1.4922 × 6^0.6859 = 5.10 by hand.
    expect(prediction.colourSrm).toBeCloseTo(5.1, 2);
  });

  it('worked example (common practice): the linear ABV estimate is (OG − FG) × 131.25', () => {
    const prediction = predictRecipe(generateMockDesign(), catalogue, MOCK_BREWHOUSE);

    expect(prediction.abvEstimate).toBeCloseTo((prediction.og! - prediction.fg!) * 131.25, 10);
  });

  it('gives each fermentable its share of the bill by mass and flags a share above the usual maximum', () => {
    const design = generateMockDesign({ fermentables: [{ fermentableId: 1, amountKg: 3 }, { fermentableId: 2, amountKg: 1 }] });

    const { shares } = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    expect(shares.map((share) => share.sharePercent)).toEqual([75, 25]);
    expect(shares.map((share) => share.aboveUsualMax)).toEqual([false, true]);
  });

  it('makes the water plan from brewhouseVolumes and strikeWaterTemperature with the brewhouse settings', () => {
    const prediction = predictRecipe(generateMockDesign(), catalogue, MOCK_BREWHOUSE);

    const plan = brewhouseVolumes(
      { batchLitres: 20, grainKilograms: 4.5, boilMinutes: 60, boilOffLitresPerHour: 4, grainAbsorptionLitresPerKg: 1, kettleLossLitres: 1.5, fermenterLossLitres: 0, mashRatioLitresPerKg: 3 },
      prediction.og!,
    );
    expect(prediction.waterPlan).toEqual({
      strikeLitres: plan.strikeLitres,
      spargeLitres: plan.spargeLitres,
      strikeTemperatureC: strikeWaterTemperature(66, 18, 3),
      preBoilLitres: plan.preBoilLitres,
      preBoilGravity: plan.preBoilGravity,
      mashEfficiencyPercent: (72 * 21.5) / 20,
      kettleCapacityLitres: null,
      exceedsKettle: false,
    });
  });

  it('leaves FG and ABV out while no yeast is chosen', () => {
    const prediction = predictRecipe(generateMockDesign({ yeastId: null }), catalogue, MOCK_BREWHOUSE);

    expect([prediction.og === null, prediction.fg, prediction.abvEstimate, prediction.abvDensityBased]).toEqual([false, null, null, null]);
  });

  it('reports a bill too strong for the gravity range as a problem instead of a figure', () => {
    const design = generateMockDesign({ batchVolumeLitres: 1, fermentables: [{ fermentableId: 1, amountKg: 50 }] });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    expect(prediction.og).toBeNull();
    expect(prediction.problems[0]).toMatch(/^OG: /);
  });

  it('predicts nothing but an empty bill when there are no fermentables', () => {
    const prediction = predictRecipe(generateMockDesign({ fermentables: [] }), catalogue, MOCK_BREWHOUSE);

    expect([prediction.og, prediction.ibu, prediction.colourSrm, prediction.waterPlan]).toEqual([null, null, null, null]);
  });
});

describe('compareToStyle', () => {
  const style: StyleTarget = {
    id: 1,
    name: 'Co-op pale',
    og: { min: 1.045, max: 1.06 },
    fg: { min: 1.008, max: 1.014 },
    abv: { min: 7, max: 9 },
    ibu: { min: 30, max: 50 },
    colourSrm: { min: 6, max: 14 },
  };

  it('sets each figure against its range, comparing ABV by the density-based figure', () => {
    const prediction = predictRecipe(generateMockDesign(), catalogue, MOCK_BREWHOUSE);

    const comparison = compareToStyle(prediction, style);

    expect(comparison.map((each) => [each.key, each.value])).toEqual([
      ['og', prediction.og],
      ['fg', prediction.fg],
      ['abv', prediction.abvDensityBased],
      ['ibu', prediction.ibu],
      ['colourSrm', prediction.colourSrm],
    ]);
    expect(comparison.find((each) => each.key === 'abv')?.position).toBe('below');
  });

  it('marks a figure that cannot be predicted with no position', () => {
    const prediction = predictRecipe(generateMockDesign({ yeastId: null }), catalogue, MOCK_BREWHOUSE);

    expect(compareToStyle(prediction, style).find((each) => each.key === 'fg')).toMatchObject({ value: null, position: null });
  });
});
