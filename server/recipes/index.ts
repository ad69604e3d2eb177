export { createRecipesRouter } from './recipes.routes';
export { createRecipesService, type RecipesService } from './recipes.service';
