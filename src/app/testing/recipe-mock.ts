import { generateMockCatalogue, generateMockDesign, MOCK_BREWHOUSE, Recipe, RECIPE_DESIGN_FORMAT, RecipeVersion } from '@shared/recipes';

/** A recipe as the API returns it, for specs; invented, as all test data. */
export function generateMockRecipe(overrides: Partial<Recipe> = {}): Recipe {
  const design = overrides.design ?? generateMockDesign();
  return {
    id: 41,
    name: design.name,
    ownerId: 11,
    ownerName: 'Priya Raman',
    visibility: 'private',
    archived: false,
    version: 1,
    styleId: design.styleId,
    batchVolumeLitres: design.batchVolumeLitres,
    updatedAt: '2026-11-30T18:00:00.000Z',
    createdAt: '2026-11-30T18:00:00.000Z',
    editable: true,
    design,
    designFormat: RECIPE_DESIGN_FORMAT,
    ingredients: generateMockCatalogue(),
    brewhouse: MOCK_BREWHOUSE,
    ...overrides,
  };
}

/** One stored version of a recipe, for specs. */
export function generateMockVersion(version: number, overrides: Partial<RecipeVersion> = {}): RecipeVersion {
  return {
    version,
    createdAt: '2026-11-30T18:00:00.000Z',
    createdBy: 'Priya Raman',
    design: generateMockDesign(),
    designFormat: RECIPE_DESIGN_FORMAT,
    ingredients: generateMockCatalogue(),
    brewhouse: MOCK_BREWHOUSE,
    ...overrides,
  };
}
