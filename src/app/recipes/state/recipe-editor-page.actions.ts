import { createActionGroup, emptyProps, props } from '@ngrx/store';
import { RecipeDesign, RecipeVisibility, UnitSystem } from '@shared/recipes';

export const RecipeEditorPageActions = createActionGroup({
  source: 'Recipe Editor Page',
  events: {
    'New Opened': emptyProps(),
    'Existing Opened': props<{ recipeId: number }>(),
    'Design Changed': props<{ design: RecipeDesign | null }>(),
    'Design Edited': emptyProps(),
    'Save Submitted': props<{ recipeId: number | null; design: RecipeDesign; visibility: RecipeVisibility }>(),
    'Visibility Changed': props<{ recipeId: number; visibility: RecipeVisibility }>(),
    'Archive Toggled': props<{ recipeId: number; archived: boolean }>(),
    'Clone Requested': props<{ recipeId: number; name: string }>(),
    'Export Requested': props<{ recipeId: number }>(),
    'Design Scaled': props<{ design: RecipeDesign }>(),
    'Unit System Changed': props<{ unitSystem: UnitSystem }>(),
    'Catalogue Update Requested': props<{ recipeId: number }>(),
  },
});
