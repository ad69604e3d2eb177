import { predictRecipe } from './recipe-prediction';
import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE } from './recipe-test-data';
import { scaleRecipe } from './scale-recipe';

const catalogue = generateMockCatalogue();

describe('scaleRecipe', () => {
  it('keeps OG and IBU when a 20 L design is scaled to 45 L', () => {
    const design = generateMockDesign();
    const before = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    const scaled = scaleRecipe(design, { batchVolumeLitres: 45, mashEfficiencyPercent: 72 }, catalogue, MOCK_BREWHOUSE);

    const after = predictRecipe(scaled, catalogue, MOCK_BREWHOUSE);
    expect(scaled.batchVolumeLitres).toBe(45);
    expect(after.og).toBeCloseTo(before.og!, 8);
    expect(after.ibu).toBeCloseTo(before.ibu!, 6);
  });

  it('keeps OG and IBU and adds grain when the efficiency drops from 72 % to 60 %', () => {
    const design = generateMockDesign();
    const before = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    const scaled = scaleRecipe(design, { batchVolumeLitres: 20, mashEfficiencyPercent: 60 }, catalogue, MOCK_BREWHOUSE);

    const after = predictRecipe(scaled, catalogue, MOCK_BREWHOUSE);
    expect(after.og).toBeCloseTo(before.og!, 8);
    expect(after.ibu).toBeCloseTo(before.ibu!, 6);
    expect(scaled.fermentables[0].amountKg).toBeCloseTo(4.2 * (72 / 60), 6);
  });

  it('keeps OG with sugar in the bill while volume and efficiency both change', () => {
    const design = generateMockDesign({ fermentables: [{ fermentableId: 1, amountKg: 4 }, { fermentableId: 3, amountKg: 0.6 }] });
    const before = predictRecipe(design, catalogue, MOCK_BREWHOUSE);

    const scaled = scaleRecipe(design, { batchVolumeLitres: 12, mashEfficiencyPercent: 80 }, catalogue, MOCK_BREWHOUSE);

    const after = predictRecipe(scaled, catalogue, MOCK_BREWHOUSE);
    expect(after.og).toBeCloseTo(before.og!, 8);
    expect(after.ibu).toBeCloseTo(before.ibu!, 6);
  });

  it('scales dry hops and other additions with the volume and leaves yeast, mash and boil alone', () => {
    const design = generateMockDesign();

    const scaled = scaleRecipe(design, { batchVolumeLitres: 40, mashEfficiencyPercent: 72 }, catalogue, MOCK_BREWHOUSE);

    expect(scaled.others[0].amount).toBeCloseTo(2, 10);
    expect(scaled.hops[2].amountGrams).toBeGreaterThan(40);
    expect([scaled.yeastId, scaled.mashSteps, scaled.boilMinutes]).toEqual([design.yeastId, design.mashSteps, design.boilMinutes]);
  });
});
