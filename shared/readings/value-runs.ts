/**
 * A column whose values mostly repeat, written as runs: `values[k]` stands `lengths[k]` times in a
 * row. A logger's readings share instrument, unit, source, note and who sent them, so its ten
 * thousand rows cost one run per such column instead of ten thousand copies.
 */
export interface ValueRuns<T> {
  values: T[];
  lengths: number[];
}

export function emptyRuns<T>(): ValueRuns<T> {
  return { values: [], lengths: [] };
}

/** Adds the next row's value: it lengthens the last run when it equals that run's value. */
export function addToRuns<T>(runs: ValueRuns<T>, value: T): void {
  const last = runs.values.length - 1;
  if (last >= 0 && runs.values[last] === value) runs.lengths[last]++;
  else {
    runs.values.push(value);
    runs.lengths.push(1);
  }
}

/** The runs as one value per row. */
export function expandRuns<T>(runs: ValueRuns<T>): T[] {
  const rows: T[] = [];
  for (let k = 0; k < runs.values.length; k++) {
    const value = runs.values[k];
    for (let n = runs.lengths[k]; n > 0; n--) rows.push(value);
  }
  return rows;
}
