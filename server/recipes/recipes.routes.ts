import { Router } from 'express';
import { signedIn } from '../auth/route-access';
import { parseId, parseRequest } from '../http/parse-request';
import { recipeDesignSchema, cloneRecipeSchema, createRecipeSchema, saveRecipeSchema, updateRecipeSchema } from './recipes.schemas';
import { RecipesService } from './recipes.service';

/** /api/recipes: every signed-in person; ownership and visibility are the service's rules. */
export function createRecipesRouter(recipes: RecipesService): Router {
  const router = Router();
  const recipeId = (params: Record<string, unknown>) => parseId(params.recipeId, 'recipeId');

  router.get('/', signedIn, async (req, res) => {
    res.json(await recipes.list(req.user!, req.query.includeArchived === 'true'));
  });

  router.post('/', signedIn, async (req, res) => {
    const { design, visibility } = parseRequest(createRecipeSchema, req.body);
    res.status(201).json(await recipes.create(req.user!, design, visibility));
  });

  router.post('/import', signedIn, async (req, res) => {
    res.status(201).json(await recipes.importFile(req.user!, req.body, (design) => parseRequest(recipeDesignSchema, design)));
  });

  router.get('/:recipeId', signedIn, async (req, res) => {
    res.json(await recipes.get(req.user!, recipeId(req.params)));
  });

  router.put('/:recipeId', signedIn, async (req, res) => {
    const { design } = parseRequest(saveRecipeSchema, req.body);
    res.json(await recipes.save(req.user!, recipeId(req.params), design));
  });

  router.post('/:recipeId/catalogue-update', signedIn, async (req, res) => {
    res.json(await recipes.updateToCatalogue(req.user!, recipeId(req.params)));
  });

  router.patch('/:recipeId', signedIn, async (req, res) => {
    const changes = parseRequest(updateRecipeSchema, req.body);
    res.json(await recipes.update(req.user!, recipeId(req.params), changes));
  });

  router.post('/:recipeId/clone', signedIn, async (req, res) => {
    const { name } = parseRequest(cloneRecipeSchema, req.body);
    res.status(201).json(await recipes.clone(req.user!, recipeId(req.params), name));
  });

  router.get('/:recipeId/versions', signedIn, async (req, res) => {
    res.json(await recipes.versions(req.user!, recipeId(req.params)));
  });

  router.get('/:recipeId/versions/:version', signedIn, async (req, res) => {
    res.json(await recipes.version(req.user!, recipeId(req.params), parseId(req.params.version, 'version')));
  });

  router.get('/:recipeId/export', signedIn, async (req, res) => {
    const { name, file } = await recipes.exportFile(req.user!, recipeId(req.params));
    const fileName = name.replace(/[^A-Za-z0-9 _-]/g, '').trim().replace(/\s+/g, '-') || 'recipe';
    res.set('Content-Disposition', `attachment; filename="${fileName}.json"`).json(file);
  });

  return router;
}
