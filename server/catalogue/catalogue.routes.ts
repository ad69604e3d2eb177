import { Router } from 'express';
import { z } from 'zod';
import { INGREDIENT_KINDS, IngredientKind } from '@shared/recipes';
import { requireRole, signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { CatalogueService } from './catalogue.service';

const kindParam = z.object({ kind: z.enum(INGREDIENT_KINDS, `must be one of ${INGREDIENT_KINDS.join(', ')}`) });
const importSchema = z.object({
  csv: z.string('must be the text of a CSV file').min(1, 'must not be empty').max(1_000_000, 'must be at most 1 MB'),
  commit: z.boolean('must be true or false'),
});
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
    const { csv, commit } = parseRequest(importSchema, req.body);
    res.json(await catalogue.importCsv(req.user!.id, parseKind(req.params), csv, commit));
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
