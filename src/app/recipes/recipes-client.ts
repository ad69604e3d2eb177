import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import {
  CloneRecipeRequest,
  CreateRecipeRequest,
  Recipe,
  RecipeExport,
  RecipeSummary,
  RecipeVersion,
  RecipeVersionSummary,
  RECIPES_PATH,
  SaveRecipeRequest,
  UpdateRecipeRequest,
  UserPreferences,
} from '@shared/recipes';
import { Observable } from 'rxjs';

/** The preferences route of the contract (units per person). */
export const PREFERENCES_PATH = '/api/preferences';

/** Typed calls to the recipe, version and preference routes. */
@Injectable({ providedIn: 'root' })
export class RecipesClient {
  private readonly http = inject(HttpClient);

  list(includeArchived: boolean): Observable<RecipeSummary[]> {
    return this.http.get<RecipeSummary[]>(RECIPES_PATH, { params: includeArchived ? { includeArchived: 'true' } : {} });
  }

  get(recipeId: number): Observable<Recipe> {
    return this.http.get<Recipe>(`${RECIPES_PATH}/${recipeId}`);
  }

  create(request: CreateRecipeRequest): Observable<Recipe> {
    return this.http.post<Recipe>(RECIPES_PATH, request);
  }

  save(recipeId: number, request: SaveRecipeRequest): Observable<Recipe> {
    return this.http.put<Recipe>(`${RECIPES_PATH}/${recipeId}`, request);
  }

  /** A new version of the saved design with today's catalogue values and brewhouse. */
  updateToCatalogue(recipeId: number): Observable<Recipe> {
    return this.http.post<Recipe>(`${RECIPES_PATH}/${recipeId}/catalogue-update`, {});
  }

  update(recipeId: number, request: UpdateRecipeRequest): Observable<Recipe> {
    return this.http.patch<Recipe>(`${RECIPES_PATH}/${recipeId}`, request);
  }

  clone(recipeId: number, request: CloneRecipeRequest): Observable<Recipe> {
    return this.http.post<Recipe>(`${RECIPES_PATH}/${recipeId}/clone`, request);
  }

  versions(recipeId: number): Observable<RecipeVersionSummary[]> {
    return this.http.get<RecipeVersionSummary[]>(`${RECIPES_PATH}/${recipeId}/versions`);
  }

  version(recipeId: number, version: number): Observable<RecipeVersion> {
    return this.http.get<RecipeVersion>(`${RECIPES_PATH}/${recipeId}/versions/${version}`);
  }

  exportRecipe(recipeId: number): Observable<RecipeExport> {
    return this.http.get<RecipeExport>(`${RECIPES_PATH}/${recipeId}/export`);
  }

  importRecipe(file: RecipeExport): Observable<Recipe> {
    return this.http.post<Recipe>(`${RECIPES_PATH}/import`, file);
  }

  preferences(): Observable<UserPreferences> {
    return this.http.get<UserPreferences>(PREFERENCES_PATH);
  }

  savePreferences(preferences: UserPreferences): Observable<UserPreferences> {
    return this.http.put<UserPreferences>(PREFERENCES_PATH, preferences);
  }
}
