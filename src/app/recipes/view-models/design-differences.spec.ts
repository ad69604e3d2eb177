import { generateMockCatalogue, generateMockDesign } from '@shared/recipes';
import { designDifferences } from './design-differences';

const catalogue = generateMockCatalogue();

describe('designDifferences', () => {
  it('marks the changed volume and amounts and leaves the rest unmarked', () => {
    const left = generateMockDesign();
    const right = generateMockDesign({ batchVolumeLitres: 40, fermentables: [{ fermentableId: 1, amountKg: 8.4 }, { fermentableId: 2, amountKg: 0.3 }] });

    const rows = designDifferences(left, right, catalogue, 'metric');

    expect(rows.filter((row) => row.changed).map((row) => [row.label, row.left, row.right])).toEqual([
      ['Batch volume', '20 L', '40 L'],
      ['Pale base malt', '4.2 kg', '8.4 kg'],
    ]);
  });

  it('shows an addition found on one side only against a dash', () => {
    const left = generateMockDesign();
    const right = generateMockDesign({ hops: [...left.hops, { hopId: 11, amountGrams: 10, time: 15, use: 'boil' }] });

    const rows = designDifferences(left, right, catalogue, 'us');

    expect(rows.find((row) => row.label === 'Bittering pellet hop · boil 15 min')).toMatchObject({ left: '—', right: '0.35 oz', changed: true });
  });
});
