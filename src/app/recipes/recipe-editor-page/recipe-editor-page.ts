import { ChangeDetectionStrategy, Component, computed, effect, ElementRef, inject, input, signal, untracked, viewChild } from '@angular/core';
import { Store } from '@ngrx/store';
import { authFeature } from '@app/auth/state/auth.feature';
import { RecipeDesign, RecipeVisibility, UnitSystem } from '@shared/recipes';
import { CatalogueUpdateOffer } from '../catalogue-update-offer/catalogue-update-offer';
import { PredictionPanel } from '../prediction-panel/prediction-panel';
import { PredictionSummary } from '../prediction-summary/prediction-summary';
import { RecipeActions } from '../recipe-actions/recipe-actions';
import { RecipeForm } from '../recipe-form/recipe-form';
import { RecipeUnavailable } from '../recipe-unavailable/recipe-unavailable';
import { ScalePanel } from '../scale-panel/scale-panel';
import { RecipeEditorPageActions } from '../state/recipe-editor-page.actions';
import { unsavedEditsFeature } from '../state/unsaved-edits.feature';
import {
  selectEditorCatalogueUpdate,
  selectEditorPrediction,
  selectEditorStyle,
  selectEditorStyleComparison,
  selectRecipeEditorViewModel,
} from '../state/recipes.selectors';

/** New and existing recipes: the form, its live predictions and what can be done with the recipe. */
@Component({
  selector: 'cw-recipe-editor-page',
  imports: [RecipeForm, PredictionPanel, PredictionSummary, RecipeActions, ScalePanel, RecipeUnavailable, CatalogueUpdateOffer],
  templateUrl: './recipe-editor-page.html',
  styleUrl: './recipe-editor-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(window:beforeunload)': 'warnBeforeUnload($event)' },
})
export class RecipeEditorPage {
  private readonly store = inject(Store);
  /** From the route; absent for a new recipe. */
  readonly recipeId = input<string>();

  protected readonly vm = this.store.selectSignal(selectRecipeEditorViewModel);
  protected readonly prediction = this.store.selectSignal(selectEditorPrediction);
  protected readonly comparisons = this.store.selectSignal(selectEditorStyleComparison);
  protected readonly style = this.store.selectSignal(selectEditorStyle);
  protected readonly isAdmin = this.store.selectSignal(authFeature.selectIsAdmin);
  protected readonly unsaved = this.store.selectSignal(unsavedEditsFeature.selectUnsaved);
  protected readonly catalogueUpdate = this.store.selectSignal(selectEditorCatalogueUpdate);
  protected readonly scaling = signal(false);
  private readonly panel = viewChild(PredictionPanel, { read: ElementRef });
  protected readonly heading = computed(() => {
    const recipe = this.vm().recipe;
    return recipe ? recipe.name : this.recipeId() ? 'Recipe' : 'New recipe';
  });

  constructor() {
    effect(() => {
      const id = this.recipeId();
      untracked(() => {
        this.scaling.set(false);
        this.store.dispatch(id ? RecipeEditorPageActions.existingOpened({ recipeId: Number(id) }) : RecipeEditorPageActions.newOpened());
      });
    });
  }

  protected changeDesign(design: RecipeDesign | null): void {
    this.store.dispatch(RecipeEditorPageActions.designChanged({ design }));
  }

  protected markEdited(): void {
    if (!this.unsaved()) this.store.dispatch(RecipeEditorPageActions.designEdited());
  }

  /** Opens the full predictions from the phone summary: brings the panel into view and moves focus there. */
  protected showPanel(): void {
    const panel = this.panel()?.nativeElement.querySelector('section') as HTMLElement | null | undefined;
    panel?.scrollIntoView({ behavior: 'smooth', block: 'start' });
    panel?.focus({ preventScroll: true });
  }

  /** The browser asks before a reload or a closed tab throws unsaved edits away. */
  protected warnBeforeUnload(event: BeforeUnloadEvent): void {
    if (!this.unsaved()) return;
    event.preventDefault();
    event.returnValue = '';
  }

  protected save(design: RecipeDesign): void {
    const recipe = this.vm().recipe;
    this.store.dispatch(
      RecipeEditorPageActions.saveSubmitted({ recipeId: recipe?.id ?? null, design, visibility: recipe?.visibility ?? 'private' }),
    );
  }

  protected applyScale(design: RecipeDesign): void {
    this.scaling.set(false);
    this.store.dispatch(RecipeEditorPageActions.designScaled({ design }));
  }

  protected clone(): void {
    const recipe = this.vm().recipe;
    if (recipe) this.store.dispatch(RecipeEditorPageActions.cloneRequested({ recipeId: recipe.id, name: `${recipe.name} (copy)` }));
  }

  protected changeVisibility(visibility: RecipeVisibility): void {
    const recipe = this.vm().recipe;
    if (recipe) this.store.dispatch(RecipeEditorPageActions.visibilityChanged({ recipeId: recipe.id, visibility }));
  }

  protected toggleArchive(archived: boolean): void {
    const recipe = this.vm().recipe;
    if (recipe) this.store.dispatch(RecipeEditorPageActions.archiveToggled({ recipeId: recipe.id, archived }));
  }

  protected exportRecipe(): void {
    const recipe = this.vm().recipe;
    if (recipe) this.store.dispatch(RecipeEditorPageActions.exportRequested({ recipeId: recipe.id }));
  }

  protected updateToCatalogue(): void {
    const recipe = this.vm().recipe;
    if (recipe) this.store.dispatch(RecipeEditorPageActions.catalogueUpdateRequested({ recipeId: recipe.id }));
  }

  protected changeUnits(unitSystem: UnitSystem): void {
    this.store.dispatch(RecipeEditorPageActions.unitSystemChanged({ unitSystem }));
  }
}
