import { Knex } from 'knex';
import { CatalogueImportExisting, CatalogueImportProblem, CatalogueImportResult, IngredientKind } from '@shared/recipes';
import { parseCatalogueCsv, ParsedCatalogueCsv } from './catalogue-csv';
import { CATALOGUE_KINDS } from './catalogue-kinds';
import { catalogueRepository } from './catalogue.repository';

/** A checked CSV: its rows, what blocks it, and which rows name existing entries. */
export interface CheckedImport {
  rows: ParsedCatalogueCsv['rows'];
  problems: CatalogueImportProblem[];
  existing: CatalogueImportExisting[];
}

/** Parses the file and compares its names with each other and with the catalogue, as the database compares names. */
export async function checkImport(db: Knex, kind: IngredientKind, csv: string): Promise<CheckedImport> {
  const spec = CATALOGUE_KINDS[kind];
  const parsed = parseCatalogueCsv(spec, csv);
  const names = parsed.rows.map((row) => String(row.entry.name));
  // Identical spellings are equal anyway; the database compares each distinct spelling once.
  const distinct = [...new Set(names)];
  const [distinctFirsts, distinctMatches] = await Promise.all([
    catalogueRepository.firstEqualNames(db, distinct),
    catalogueRepository.idsByEqualName(db, spec, distinct),
  ]);
  const distinctIndex = new Map(distinct.map((name, index) => [name, index]));
  const firstRowOf = new Map<string, number>();
  names.forEach((name, index) => firstRowOf.has(name) || firstRowOf.set(name, index));
  const firsts = names.map((name) => firstRowOf.get(distinct[distinctFirsts[distinctIndex.get(name)!]])!);
  const matches = new Map(
    names.flatMap((name, index) => {
      const match = distinctMatches.get(distinctIndex.get(name)!);
      return match ? [[index, match] as const] : [];
    }),
  );
  const problems = [...parsed.problems];
  const existing: CatalogueImportExisting[] = [];
  parsed.rows.forEach((row, index) => {
    const first = parsed.rows[firsts[index]];
    if (firsts[index] !== index) {
      problems.push({ line: row.line, reason: `name "${names[index]}" is the same as "${names[firsts[index]]}" on line ${first.line}` });
      return;
    }
    const match = matches.get(index);
    if (match) existing.push({ line: row.line, name: names[index], existingId: match.id, existingName: match.name });
  });
  problems.sort((a, b) => a.line - b.line);
  return { rows: parsed.rows, problems, existing };
}

/** The result sent back for a preview or a refused commit. */
export function importResult(kind: IngredientKind, checked: CheckedImport, counts = { imported: 0, updated: 0, skipped: 0 }): CatalogueImportResult {
  return {
    kind,
    rows: checked.rows.map((r) => r.entry as CatalogueImportResult['rows'][number]),
    problems: checked.problems,
    existing: checked.existing,
    ...counts,
  };
}
