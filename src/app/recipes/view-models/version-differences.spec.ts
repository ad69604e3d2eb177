import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE, predictRecipe, RecipePrediction } from '@shared/recipes';
import { generateMockVersion } from '@app/testing/recipe-mock';
import { ingredientValueDifferences, predictionDifferences, versionDifferences } from './version-differences';

const base = predictRecipe(generateMockDesign(), generateMockCatalogue(), MOCK_BREWHOUSE);

describe('version differences', () => {
  it('does not mark a figure whose shown value is the same on both sides (6.3 against 6.3)', () => {
    const left: RecipePrediction = { ...base, colourSrm: 6.31, ibu: 28.2 };
    const right: RecipePrediction = { ...base, colourSrm: 6.34, ibu: 31.6 };

    const rows = predictionDifferences(left, right);

    expect(rows.find((row) => row.label === 'Colour (SRM)')).toMatchObject({ left: '6.3', right: '6.3', changed: false });
    expect(rows.find((row) => row.label === 'IBU')).toMatchObject({ left: '28', right: '32', changed: true });
  });

  it('when two versions are equal, then no line of any section is marked', () => {
    const rows = versionDifferences(generateMockVersion(1), generateMockVersion(2), [base, base], 'metric');

    expect(rows.filter((row) => row.changed)).toEqual([]);
  });

  it('shows an ingredient value updated from the catalogue as its own line', () => {
    const catalogue = generateMockCatalogue();
    const updated = { ...catalogue, hops: catalogue.hops.map((hop) => (hop.id === 11 ? { ...hop, alphaAcidPercent: 15 } : hop)) };

    const rows = ingredientValueDifferences(catalogue, updated).filter((row) => row.changed);

    expect(rows).toEqual([
      { section: 'Ingredient values', label: 'Bittering pellet hop', left: 'pellet, alpha acid 12 %', right: 'pellet, alpha acid 15 %', changed: true },
    ]);
  });
});
