import { Knex } from 'knex';
import { z } from 'zod';
import { CatalogueImportResult, IngredientCatalogue, IngredientKind } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { AppError } from '../errors/app-error';
import { parseRequest } from '../http/parse-request';
import { parseCatalogueCsv } from './catalogue-csv';
import { CATALOGUE_KINDS, CatalogueKind } from './catalogue-kinds';
import { catalogueRepository } from './catalogue.repository';

function isDuplicate(error: unknown): boolean {
  return (error as { code?: string }).code === 'ER_DUP_ENTRY';
}

/** A change names only fields of its kind (checked whole after merging) and may retire the entry. */
function patchSchemaOf(spec: CatalogueKind) {
  const fields = Object.fromEntries(Object.keys(spec.columns).map((field) => [field, z.unknown().optional()]));
  return z.object({ ...fields, retired: z.boolean('must be true or false').optional() }).strict();
}

const nameTaken = () => new AppError('name-taken', 'The catalogue already has an entry with this name.', 409, { name: 'is already in the catalogue' });

/** The co-op's ingredient catalogue: anyone reads it; brewers and admins keep it. */
export function createCatalogueService(db: Knex) {
  async function insertChecked(trx: Knex, kind: IngredientKind, entry: Record<string, unknown>): Promise<number> {
    try {
      return await catalogueRepository.insert(trx, CATALOGUE_KINDS[kind], entry);
    } catch (error) {
      if (isDuplicate(error)) throw nameTaken();
      throw error;
    }
  }

  return {
    async list(includeRetired: boolean): Promise<IngredientCatalogue> {
      const [fermentables, hops, yeasts, others] = await Promise.all(
        (['fermentables', 'hops', 'yeasts', 'others'] as const).map((kind) => catalogueRepository.list(db, CATALOGUE_KINDS[kind], includeRetired)),
      );
      return { fermentables, hops, yeasts, others } as unknown as IngredientCatalogue;
    },

    async create(actorId: number, kind: IngredientKind, body: unknown): Promise<Record<string, unknown>> {
      const spec = CATALOGUE_KINDS[kind];
      const entry = parseRequest(spec.schema, body);
      const id = await insertChecked(db, kind, entry);
      await recordAudit(db, { actorUserId: actorId, action: 'ingredient-added', subjectType: spec.table, subjectId: id });
      return (await catalogueRepository.findById(db, spec, id))!;
    },

    /** Changes some fields and/or retires; unknown fields are refused, the merged entry is validated whole, and only validated changes are audited with the update. */
    async update(actorId: number, kind: IngredientKind, id: number, body: Record<string, unknown>): Promise<Record<string, unknown>> {
      const spec = CATALOGUE_KINDS[kind];
      const { retired, ...changes } = parseRequest(patchSchemaOf(spec), body);
      const existing = await catalogueRepository.findById(db, spec, id);
      if (!existing) throw new AppError('ingredient-not-found', 'No catalogue entry has this id.', 404);
      const { id: _id, retired: _retired, ...current } = existing;
      const merged = parseRequest(spec.schema, { ...current, ...changes });
      const audited: Record<string, unknown> = Object.fromEntries(Object.keys(changes).map((field) => [field, merged[field]]));
      if (retired !== undefined) audited.retired = retired;
      try {
        await transactionWithRetry(db, async (trx) => {
          await catalogueRepository.update(trx, spec, id, merged, retired);
          await recordAudit(trx, { actorUserId: actorId, action: 'ingredient-changed', subjectType: spec.table, subjectId: id, detail: audited });
        });
      } catch (error) {
        if (isDuplicate(error)) throw nameTaken();
        throw error;
      }
      return (await catalogueRepository.findById(db, spec, id))!;
    },

    /** Previews a CSV; with `commit` and no problems, adds every row in one transaction. */
    async importCsv(actorId: number, kind: IngredientKind, csv: string, commit: boolean): Promise<CatalogueImportResult> {
      const spec = CATALOGUE_KINDS[kind];
      const parsed = parseCatalogueCsv(spec, csv);
      const taken = await catalogueRepository.existingNames(db, spec, parsed.rows.map((r) => String(r.entry.name)));
      const problems = [
        ...parsed.problems,
        ...parsed.rows.filter((r) => taken.has(String(r.entry.name).toLowerCase())).map((r) => ({ line: r.line, reason: `"${r.entry.name}" is already in the catalogue` })),
      ].sort((a, b) => a.line - b.line);
      const result: CatalogueImportResult = { kind, rows: parsed.rows.map((r) => r.entry as CatalogueImportResult['rows'][number]), problems, imported: 0 };
      if (!commit || problems.length > 0 || parsed.rows.length === 0) return result;
      await db.transaction(async (trx) => {
        for (const row of parsed.rows) await insertChecked(trx, kind, row.entry);
        await recordAudit(trx, { actorUserId: actorId, action: 'ingredients-imported', subjectType: spec.table, subjectId: null, detail: { count: parsed.rows.length } });
      });
      return { ...result, imported: parsed.rows.length };
    },
  };
}

export type CatalogueService = ReturnType<typeof createCatalogueService>;
