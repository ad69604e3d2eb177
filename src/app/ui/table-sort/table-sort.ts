/** Which column a table is sorted by, and which way. */
export interface TableSort<K extends string = string> {
  column: K;
  direction: 'asc' | 'desc';
}

/** The sort after a click on a column header: the same column flips, another starts ascending. */
export function nextSort<K extends string>(current: TableSort<K>, column: K): TableSort<K> {
  if (current.column !== column) return { column, direction: 'asc' };
  return { column, direction: current.direction === 'asc' ? 'desc' : 'asc' };
}

/** Rows sorted by one value each; text compares as people read it (Café beside Cafe), numbers by size. */
export function sortRows<T>(rows: readonly T[], sort: TableSort, valueOf: (row: T, column: string) => string | number | null): T[] {
  const sign = sort.direction === 'asc' ? 1 : -1;
  const collator = new Intl.Collator('en', { sensitivity: 'base', numeric: true });
  return [...rows].sort((a, b) => {
    const [x, y] = [valueOf(a, sort.column), valueOf(b, sort.column)];
    if (x === y) return 0;
    if (x === null) return 1;
    if (y === null) return -1;
    return sign * (typeof x === 'number' && typeof y === 'number' ? x - y : collator.compare(String(x), String(y)));
  });
}

/** The aria-sort value of a column header. */
export function ariaSort(sort: TableSort, column: string): 'ascending' | 'descending' | 'none' {
  if (sort.column !== column) return 'none';
  return sort.direction === 'asc' ? 'ascending' : 'descending';
}
