import { Knex } from 'knex';
import { z } from 'zod';
import { SessionUser } from '@shared/auth';
import { CatalogueImportResult, ImportChoice, IngredientCatalogue, IngredientKind, IngredientUsage } from '@shared/recipes';
import { recordAudit } from '../audit/audit-log.repository';
import { transactionWithRetry } from '../transactions/retry-deadlock';
import { AppError } from '../errors/app-error';
import { parseRequest } from '../http/parse-request';
import { ingredientUsage } from '../recipes/ingredient-usage';
import { checkImport, importResult } from './catalogue-import';
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
const notFound = () => new AppError('ingredient-not-found', 'No catalogue entry has this id.', 404);

/** Runs a write; a unique-name clash becomes a 409 naming the field. */
async function checkedWrite<T>(write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (isDuplicate(error)) throw nameTaken();
    throw error;
  }
}

/** The co-op's ingredient catalogue: anyone reads it; brewers and admins keep it. */
export function createCatalogueService(db: Knex) {
  async function existing(kind: IngredientKind, id: number): Promise<Record<string, unknown>> {
    const entry = await catalogueRepository.findById(db, CATALOGUE_KINDS[kind], id);
    if (!entry) throw notFound();
    return entry;
  }

  return {
    async list(includeRetired: boolean): Promise<IngredientCatalogue> {
      const [fermentables, hops, yeasts, others] = await Promise.all(
        (['fermentables', 'hops', 'yeasts', 'others'] as const).map((kind) => catalogueRepository.list(db, CATALOGUE_KINDS[kind], includeRetired)),
      );
      return { fermentables, hops, yeasts, others } as unknown as IngredientCatalogue;
    },

    /** Adds an entry and its audit entry in one transaction. */
    async create(actorId: number, kind: IngredientKind, body: unknown): Promise<Record<string, unknown>> {
      const spec = CATALOGUE_KINDS[kind];
      const entry = parseRequest(spec.schema, body);
      const id = await checkedWrite(() =>
        transactionWithRetry(db, async (trx) => {
          const newId = await catalogueRepository.insert(trx, spec, entry);
          await recordAudit(trx, { actorUserId: actorId, action: 'ingredient-added', subjectType: spec.table, subjectId: newId });
          return newId;
        }),
      );
      return existing(kind, id);
    },

    /** Changes some fields and/or retires; unknown fields are refused, the merged entry is validated whole, and only validated changes are audited with the update. */
    async update(actorId: number, kind: IngredientKind, id: number, body: Record<string, unknown>): Promise<Record<string, unknown>> {
      const spec = CATALOGUE_KINDS[kind];
      const { retired, ...changes } = parseRequest(patchSchemaOf(spec), body);
      const { id: _id, ingredientId: _identity, retired: _retired, ...current } = await existing(kind, id);
      const merged = parseRequest(spec.schema, { ...current, ...changes });
      const audited: Record<string, unknown> = Object.fromEntries(Object.keys(changes).map((field) => [field, merged[field]]));
      if (retired !== undefined) audited.retired = retired;
      await checkedWrite(() =>
        transactionWithRetry(db, async (trx) => {
          await catalogueRepository.update(trx, spec, id, merged, retired);
          await recordAudit(trx, { actorUserId: actorId, action: 'ingredient-changed', subjectType: spec.table, subjectId: id, detail: audited });
        }),
      );
      return existing(kind, id);
    },

    /** The recipes and versions that use an entry, as far as the caller may see them. */
    async usedIn(user: SessionUser, kind: IngredientKind, id: number): Promise<IngredientUsage> {
      const entry = await existing(kind, id);
      return ingredientUsage(db, user, entry.ingredientId as number);
    },

    /**
     * Previews a CSV; a commit with no problems and a choice for every existing name adds the new
     * rows and updates or skips the others, all in one transaction.
     */
    async importCsv(actorId: number, kind: IngredientKind, csv: string, commit: boolean, choiceList: { line: number; choice: ImportChoice }[] = []): Promise<CatalogueImportResult> {
      const spec = CATALOGUE_KINDS[kind];
      const checked = await checkImport(db, kind, csv);
      if (!commit || checked.problems.length > 0 || checked.rows.length === 0) return importResult(kind, checked);
      const choices = new Map(choiceList.map((each) => [each.line, each.choice]));
      const undecided = checked.existing.filter((each) => !choices.has(each.line));
      if (undecided.length) {
        const problems = undecided.map((each) => ({ line: each.line, reason: `"${each.name}" is already in the catalogue as "${each.existingName}": choose skip or update` }));
        return importResult(kind, { ...checked, problems });
      }
      const existingByLine = new Map(checked.existing.map((each) => [each.line, each]));
      const counts = { imported: 0, updated: 0, skipped: 0 };
      await checkedWrite(() =>
        transactionWithRetry(db, async (trx) => {
          for (const row of checked.rows) {
            const match = existingByLine.get(row.line);
            if (!match) {
              await catalogueRepository.insert(trx, spec, row.entry);
              counts.imported += 1;
            } else if (choices.get(row.line) === 'update') {
              await catalogueRepository.update(trx, spec, match.existingId, { ...row.entry, name: match.existingName });
              counts.updated += 1;
            } else counts.skipped += 1;
          }
          await recordAudit(trx, { actorUserId: actorId, action: 'ingredients-imported', subjectType: spec.table, subjectId: null, detail: { ...counts } });
        }),
      );
      return importResult(kind, checked, counts);
    },
  };
}

export type CatalogueService = ReturnType<typeof createCatalogueService>;
