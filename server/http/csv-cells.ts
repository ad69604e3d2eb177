import { stringify } from 'csv-stringify/sync';

/** A cell a spreadsheet would read as a formula gets a leading apostrophe (CSV injection). */
export function neutraliseCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** Lines of cells as CSV, every cell (the header's too) neutralised for spreadsheets. */
export function csvOfCells(lines: readonly (readonly string[])[]): string {
  return stringify(lines.map((cells) => cells.map(neutraliseCell)));
}
