import { hopStandIbu, tinsethIbu } from '@shared/science';
import { HOP_STAND_TEMPERATURE_C } from './hop-timing';
import { predictRecipe } from './recipe-prediction';
import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE } from './recipe-test-data';

const catalogue = generateMockCatalogue();

describe('predictRecipe, brewing rules', () => {
  // One efficiency, the brewhouse efficiency into the fermenter: the kettle after the boil held the batch's
  // wort plus the kettle loss at the same gravity, so its extract (points × cold litres) is the OG's times
  // (batch + kettle loss) / batch, and the pre-boil gravity must carry exactly that extract (common practice).
  it('gives a pre-boil gravity that carries the extract the brewhouse efficiency puts into the kettle', () => {
    const brewhouse = { ...MOCK_BREWHOUSE, kettleLossLitres: 1.5 };

    const prediction = predictRecipe(generateMockDesign({ batchVolumeLitres: 23 }), catalogue, brewhouse);

    const plan = prediction.waterPlan!;
    const coldPreBoilLitres = plan.preBoilLitres * 0.96; // the plan's 4 % cooling shrinkage
    const kettleExtract = (plan.preBoilGravity - 1) * coldPreBoilLitres;
    expect(kettleExtract).toBeCloseTo((prediction.og! - 1) * (23 + 1.5), 9);
    expect(plan.mashEfficiencyPercent).toBeCloseTo((72 * 24.5) / 23, 9);
  });

  it('gives a whirlpool addition the hop-stand IBU at the assumed stand temperature, not 0', () => {
    const design = generateMockDesign({ hops: [{ hopId: 11, amountGrams: 40, time: 20, use: 'whirlpool' }] });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    const expected = hopStandIbu({ grams: 40, alphaPercent: 12, minutes: 20 }, prediction.og!, 20, HOP_STAND_TEMPERATURE_C);
    expect(prediction.hopBitterness[0].ibu).toBeCloseTo(expected, 12);
    expect(expected).toBeGreaterThan(0);
  });

  it('gives first-wort hops the whole boil', () => {
    const design = generateMockDesign({ boilMinutes: 75, hops: [{ hopId: 11, amountGrams: 20, time: 0, use: 'first wort' }] });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    expect(prediction.hopBitterness[0].ibu).toBeCloseTo(tinsethIbu({ grams: 20, alphaPercent: 12, minutes: 75 }, prediction.og!, 20), 12);
  });

  it('reports a boil addition longer than the boil as a problem instead of cutting it to the boil', () => {
    const design = generateMockDesign({ boilMinutes: 60, hops: [{ hopId: 11, amountGrams: 20, time: 90, use: 'boil' }] });

    const prediction = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    expect(prediction.hopBitterness).toEqual([]);
    expect(prediction.problems).toContain('Hop addition 1: time must be at most the boil time, 60 min.');
  });

  it('warns when the pre-boil wort does not fit the kettle', () => {
    const small = predictRecipe(generateMockDesign(), catalogue, { ...MOCK_BREWHOUSE, kettleCapacityLitres: 20 });
    const large = predictRecipe(generateMockDesign(), catalogue, { ...MOCK_BREWHOUSE, kettleCapacityLitres: 50 });

    expect([small.waterPlan!.exceedsKettle, large.waterPlan!.exceedsKettle]).toEqual([true, false]);
  });
});
