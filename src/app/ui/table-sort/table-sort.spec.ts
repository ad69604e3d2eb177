import { ariaSort, nextSort, sortRows } from './table-sort';

describe('table sort', () => {
  const rows = [
    { name: 'café stout', version: 10 },
    { name: 'Amber', version: 2 },
    { name: 'Cafe pale', version: null },
  ];
  const valueOf = (row: (typeof rows)[number], column: string) => (column === 'name' ? row.name : row.version);

  it('sorts text regardless of case and accents, numbers by size, and blanks last', () => {
    expect(sortRows(rows, { column: 'name', direction: 'asc' }, valueOf).map((r) => r.name)).toEqual(['Amber', 'Cafe pale', 'café stout']);
    expect(sortRows(rows, { column: 'version', direction: 'desc' }, valueOf).map((r) => r.version)).toEqual([10, 2, null]);
  });

  it('flips the direction on a second click and starts a new column ascending', () => {
    expect(nextSort({ column: 'name', direction: 'asc' }, 'name')).toEqual({ column: 'name', direction: 'desc' });
    expect(nextSort({ column: 'name', direction: 'desc' }, 'version')).toEqual({ column: 'version', direction: 'asc' });
    expect(ariaSort({ column: 'name', direction: 'desc' }, 'name')).toBe('descending');
  });
});
