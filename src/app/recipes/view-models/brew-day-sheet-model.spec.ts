import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE, predictRecipe } from '@shared/recipes';
import { generateMockRecipe } from '@app/testing/recipe-mock';
import { brewDaySheet } from './brew-day-sheet-model';

const catalogue = generateMockCatalogue();

describe('brewDaySheet', () => {
  it('lists the additions in the order of the day: first wort, the boil counting down, whirlpool, dry hop', () => {
    const design = generateMockDesign({
      hops: [
        { hopId: 12, amountGrams: 40, time: 3, use: 'dry hop' },
        { hopId: 12, amountGrams: 30, time: 10, use: 'boil' },
        { hopId: 12, amountGrams: 20, time: 20, use: 'whirlpool' },
        { hopId: 11, amountGrams: 20, time: 60, use: 'boil' },
        { hopId: 11, amountGrams: 10, time: 0, use: 'first wort' },
      ],
    });

    const sheet = brewDaySheet(generateMockRecipe({ design }), catalogue, MOCK_BREWHOUSE, null, 'metric');

    expect(sheet.additions.map((addition) => addition.when)).toEqual([
      'First wort, the whole boil',
      '60 min before the end of the boil',
      '10 min before the end of the boil',
      'Whirlpool, 20 min stand at about 80 °C',
      'Dry hop, 3 days before packaging',
    ]);
  });

  it('carries the predictions of the shared library and amounts in the person’s units', () => {
    const recipe = generateMockRecipe();

    const sheet = brewDaySheet(recipe, catalogue, MOCK_BREWHOUSE, null, 'us');

    expect(sheet.prediction).toEqual(predictRecipe(recipe.design, catalogue, MOCK_BREWHOUSE));
    expect(sheet.fermentables[0]).toMatchObject({ name: 'Pale base malt', amount: '9.26 lb' });
    expect(sheet.batchVolume).toBe('5.28 gal');
  });
});
