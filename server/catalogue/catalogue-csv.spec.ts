import { parseCatalogueCsv } from './catalogue-csv';
import { CATALOGUE_CSV_COLUMNS } from '@shared/recipes';
import { CATALOGUE_KINDS } from './catalogue-kinds';

describe('parseCatalogueCsv', () => {
  const hops = CATALOGUE_KINDS.hops;

  it('when every row is valid, then rows come back typed with their line numbers', () => {
    const result = parseCatalogueCsv(hops, 'name,alphaAcidPercent,form\nBitter one,12.5,pellet\n"Aroma, whole",4,whole\n');
    expect(result.problems).toEqual([]);
    expect(result.rows).toEqual([
      { line: 2, entry: { name: 'Bitter one', alphaAcidPercent: 12.5, form: 'pellet' } },
      { line: 3, entry: { name: 'Aroma, whole', alphaAcidPercent: 4, form: 'whole' } },
    ]);
  });

  it('when a decimal comma is used, then it is read as a decimal point', () => {
    expect(parseCatalogueCsv(hops, 'name,alphaAcidPercent,form\nComma hop,"5,5",pellet').rows[0].entry.alphaAcidPercent).toBe(5.5);
  });

  it('when rows are bad, then each is reported by its line with the field and reason', () => {
    const result = parseCatalogueCsv(hops, 'name,alphaAcidPercent,form\nGood,5,pellet\n,5,pellet\nHigh,abc,pellet\nGood,6,cone');
    expect(result.problems.map((p) => p.line)).toEqual([3, 4, 5]);
    expect(result.problems[1].reason).toContain('alphaAcidPercent');
    expect(result.problems[2].reason).toBe('form must be one of pellet, whole, extract');
  });

  it('when a row has too few or too many values, then it is reported and the rows after it are still checked', () => {
    const result = parseCatalogueCsv(hops, 'name,alphaAcidPercent,form\nShort,5\nGood,5,pellet\nLong,5,pellet,extra\nBad,abc,pellet');
    expect(result.problems).toEqual([
      { line: 2, reason: 'has 2 values where the header names 3 columns' },
      { line: 4, reason: 'has 4 values where the header names 3 columns' },
      { line: 5, reason: 'alphaAcidPercent must be a number' },
    ]);
    expect(result.rows.map((r) => r.line)).toEqual([3]);
  });

  it.each(['0x10', '1e1', 'Infinity', '12abc', '0b1'])('when a number is written as %s, then it is refused rather than read as a number', (raw) => {
    const result = parseCatalogueCsv(hops, `name,alphaAcidPercent,form\nOdd,${raw},pellet`);
    expect(result.problems).toEqual([{ line: 2, reason: 'alphaAcidPercent must be a number' }]);
  });

  it('when the file is not CSV, then line-numbered problems explain it', () => {
    const result = parseCatalogueCsv(hops, 'name,alphaAcidPercent,form\n"unterminated,5,pellet');
    expect(result.rows).toEqual([]);
    expect(result.problems[0].reason).toContain('not valid CSV');
  });

  it('when one row opens a quote it never closes, then that row and every other bad row are reported by line, and good rows still come back', () => {
    const csv = 'name,alphaAcidPercent,form\nGood,5,pellet\n"Unterminated,5,pellet\nShort,5\nHigh,abc,pellet\nAlso good,6,whole\n';
    const result = parseCatalogueCsv(hops, csv);
    expect(result.problems.map((p) => p.line)).toEqual([3, 4, 5]);
    expect(result.problems[0].reason).toContain('quote');
    expect(result.problems[1].reason).toBe('has 2 values where the header names 3 columns');
    expect(result.problems[2].reason).toBe('alphaAcidPercent must be a number');
    expect(result.rows.map((r) => r.line)).toEqual([2, 6]);
  });

  it.each(Object.values(CATALOGUE_KINDS).map((spec) => [spec.kind, spec] as const))('when the %s columns are compared, then the stored fields are exactly the shared CSV columns', (_kind, spec) => {
    expect(Object.keys(spec.columns)).toEqual([...CATALOGUE_CSV_COLUMNS[spec.kind]]);
  });
});
