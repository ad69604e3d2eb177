import { DEFAULT_BREWHOUSE_SETTINGS } from './brewhouse-settings';
import { otherFromFreeText } from './other-units';
import { catalogueWithSnapshot, changesSinceSnapshot, ingredientsUsedBy, sameDesign } from './recipe-snapshot';
import { generateMockCatalogue, generateMockDesign } from './recipe-test-data';

const catalogue = generateMockCatalogue();

describe('recipe snapshots', () => {
  it('ingredientsUsedBy keeps exactly the entries a design names', () => {
    const used = ingredientsUsedBy(generateMockDesign(), catalogue);

    expect(used.fermentables.map((e) => e.id)).toEqual([1, 2]);
    expect(used.hops.map((e) => e.id)).toEqual([11, 12]);
    expect(used.yeasts.map((e) => e.id)).toEqual([21]);
    expect(used.others.map((e) => e.id)).toEqual([31]);
  });

  it("catalogueWithSnapshot prefers the version's own values and adds today's entries behind them", () => {
    const snapshot = { ...ingredientsUsedBy(generateMockDesign(), catalogue), hops: [{ ...catalogue.hops[0], alphaAcidPercent: 9 }] };

    const merged = catalogueWithSnapshot(snapshot, catalogue);

    expect(merged.hops.find((h) => h.id === 11)!.alphaAcidPercent).toBe(9);
    expect(merged.hops.find((h) => h.id === 12)!.alphaAcidPercent).toBe(4.5);
    expect(merged.fermentables.map((e) => e.id).sort()).toEqual([1, 2, 3, 4]);
  });

  it('changesSinceSnapshot lists each property and brewhouse setting that differs, and nothing when all agree', () => {
    const snapshot = { ingredients: ingredientsUsedBy(generateMockDesign(), catalogue), brewhouse: DEFAULT_BREWHOUSE_SETTINGS };
    expect(changesSinceSnapshot(snapshot, catalogue, DEFAULT_BREWHOUSE_SETTINGS)).toEqual([]);

    const today = { ...catalogue, yeasts: [{ ...catalogue.yeasts[0], attenuationMaxPercent: 80, retired: true }] };
    const changes = changesSinceSnapshot(snapshot, today, { ...DEFAULT_BREWHOUSE_SETTINGS, kettleLossLitres: 2 });

    expect(changes).toEqual([
      { source: 'yeasts', name: 'Clean ale yeast', field: 'attenuationMaxPercent', was: 77, now: 80 },
      { source: 'brewhouse', name: '', field: 'kettleLossLitres', was: 1.5, now: 2 },
    ]);
  });

  it('sameDesign ignores key order but not a changed amount', () => {
    const design = generateMockDesign();
    const reordered = Object.fromEntries(Object.entries(design).reverse()) as typeof design;

    expect(sameDesign(design, reordered)).toBe(true);
    expect(sameDesign(design, { ...design, batchVolumeLitres: 20.000000001 })).toBe(false);
  });
});

describe('otherFromFreeText', () => {
  it.each([
    ['g', 10, 'g', 10],
    ['Grams', 10, 'g', 10],
    ['ml', 5, 'mL', 5],
    ['litres', 1, 'L', 1],
    // Metric teaspoon 5 mL (common practice); avoirdupois ounce 28.349523125 g (exact by definition).
    ['tsp', 2, 'mL', 10],
    ['oz', 1, 'g', 28.349523125],
  ])('reads %s as the fixed unit', (unit, amount, fixed, converted) => {
    expect(otherFromFreeText({ amount, unit, when: 'boil' })).toEqual({ amount: converted, unit: fixed, when: 'boil' });
  });

  it('counts an unlisted unit in pieces and keeps its word in "when"', () => {
    expect(otherFromFreeText({ amount: 1, unit: 'tablet', when: 'boil 10 min' })).toEqual({ amount: 1, unit: 'each', when: 'boil 10 min (tablet)' });
  });
});
