import { Router } from 'express';
import { z } from 'zod';
import { CATALOGUE_CSV_MAX_BYTES, CATALOGUE_CSV_MAX_TEXT, IMPORT_CHOICES, INGREDIENT_KINDS, IngredientKind } from '@shared/recipes';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { CatalogueService } from './catalogue.service';

const kindParam = z.object({ kind: z.enum(INGREDIENT_KINDS, `must be one of ${INGREDIENT_KINDS.join(', ')}`) });
const importSchema = z.object({
  csv: z
    .string('must be the text of a CSV file')
    .min(1, 'must not be empty')
    .refine((csv) => Buffer.byteLength(csv, 'utf8') <= CATALOGUE_CSV_MAX_BYTES, `must be at most ${CATALOGUE_CSV_MAX_TEXT}`),
  commit: z.boolean('must be true or false'),
  choices: z
    .array(z.object({ line: z.number().int().positive(), choice: z.enum(IMPORT_CHOICES, `must be one of ${IMPORT_CHOICES.join(', ')}`) }))
    .optional(),
});

/**
 * JSON body limit of the import route: the CSV limit plus room for JSON escaping (a file of quotes
 * doubles) and the choices. Mounted ahead of the API's general 100 kB limit.
 */
export const CATALOGUE_IMPORT_BODY_LIMIT = CATALOGUE_CSV_MAX_BYTES * 2 + 200_000;
export const CATALOGUE_IMPORT_PATH = '/api/ingredients/:kind/import';
const patchSchema = z.record(z.string(), z.unknown());

function parseKind(params: unknown): IngredientKind {
  return parseRequest(kindParam, params).kind;
}

/** /api/ingredients: read by everyone, kept by brewers and admins. */
export function createCatalogueRouter(catalogue: CatalogueService): Router {
  const router = Router();
  const keepers = requireRole('brewer', 'admin');

  router.get('/', signedIn, async (req, res) => {
    res.json(await catalogue.list(req.query.includeRetired === 'true'));
  });

  router.post('/:kind/import', keepers, async (req, res) => {
    const { csv, commit, choices } = parseRequest(importSchema, req.body);
    res.json(await catalogue.importCsv(req.user!.id, parseKind(req.params), csv, commit, choices));
  });

  router.get('/:kind/:ingredientId/used-in', signedIn, async (req, res) => {
    const kind = parseKind({ kind: req.params.kind });
    res.json(await catalogue.usedIn(req.user!, kind, parseId(req.params.ingredientId, 'ingredientId')));
  });

  router.post('/:kind', keepers, async (req, res) => {
    res.status(201).json(await catalogue.create(req.user!.id, parseKind(req.params), req.body));
  });

  router.patch('/:kind/:ingredientId', keepers, async (req, res) => {
    const kind = parseKind({ kind: req.params.kind });
    const id = parseId(req.params.ingredientId, 'ingredientId');
    res.json(await catalogue.update(req.user!.id, kind, id, parseRequest(patchSchema, req.body)));
  });

  return router;
}
