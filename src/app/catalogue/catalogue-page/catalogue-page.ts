import { ChangeDetectionStrategy, Component, inject, OnInit, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatTab, MatTabGroup } from '@angular/material/tabs';
import { RouterLink } from '@angular/router';
import { Store } from '@ngrx/store';
import { BrewhouseSettings, CATALOGUE_CSV_MAX_BYTES, CATALOGUE_CSV_MAX_TEXT, INGREDIENT_KINDS, IngredientKind, StyleTarget, StyleTargetInput } from '@shared/recipes';
import { BrewhouseForm } from '@app/brewhouse/brewhouse-form/brewhouse-form';
import { CATALOGUE_CSV_COLUMNS, KIND_LABELS } from '../catalogue-columns';
import { CatalogueEntry, CatalogueEntryInput } from '../catalogue-entry';
import { CatalogueEntryForm } from '../catalogue-entry-form/catalogue-entry-form';
import { CatalogueTable, RetiredChange } from '../catalogue-table/catalogue-table';
import { CsvImportPreview, ImportChoiceLine } from '../csv-import-preview/csv-import-preview';
import { IngredientUsagePanel } from '../ingredient-usage-panel/ingredient-usage-panel';
import { StyleForm } from '@app/styles/style-form/style-form';
import { StyleTable } from '@app/styles/style-table/style-table';
import { CataloguePageActions } from '../state/catalogue-page.actions';
import { selectBrewhouseOrDefault, selectCataloguePageViewModel } from '../state/catalogue.selectors';

/** The co-op's ingredient catalogue by kind, its style list and brewhouse settings. */
@Component({
  selector: 'cw-catalogue-page',
  imports: [CatalogueTable, CatalogueEntryForm, CsvImportPreview, IngredientUsagePanel, StyleTable, StyleForm, BrewhouseForm, RouterLink,
    MatTabGroup, MatTab, MatButton, MatIcon, MatCheckbox, MatFormField, MatLabel, MatInput],
  templateUrl: './catalogue-page.html',
  styleUrl: './catalogue-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CataloguePage implements OnInit {
  private readonly store = inject(Store);

  protected readonly vm = this.store.selectSignal(selectCataloguePageViewModel);
  protected readonly brewhouse = this.store.selectSignal(selectBrewhouseOrDefault);
  protected readonly kinds = INGREDIENT_KINDS;
  protected readonly labels = KIND_LABELS;
  protected readonly csvColumns = CATALOGUE_CSV_COLUMNS;
  protected readonly editing = signal<CatalogueEntry | null>(null);
  protected readonly editingStyle = signal<StyleTarget | null>(null);
  protected readonly csvLimit = CATALOGUE_CSV_MAX_TEXT;
  /** A file refused before upload, by kind. */
  protected readonly fileError = signal<{ kind: IngredientKind; message: string } | null>(null);

  ngOnInit(): void {
    this.store.dispatch(CataloguePageActions.opened());
  }

  protected search(search: string): void {
    this.store.dispatch(CataloguePageActions.searchChanged({ search }));
  }

  protected includeRetired(includeRetired: boolean): void {
    this.store.dispatch(CataloguePageActions.includeRetiredChanged({ includeRetired }));
  }

  protected saveEntry(kind: IngredientKind, input: CatalogueEntryInput): void {
    const editing = this.editing();
    this.editing.set(null);
    this.store.dispatch(editing ? CataloguePageActions.entryChanged({ kind, id: editing.id, input }) : CataloguePageActions.entryAdded({ kind, input }));
  }

  protected changeRetired(kind: IngredientKind, change: RetiredChange): void {
    this.store.dispatch(CataloguePageActions.entryRetiredChanged({ kind, ...change }));
  }

  protected async previewFile(kind: IngredientKind, input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0];
    if (!file) return;
    input.value = '';
    if (file.size > CATALOGUE_CSV_MAX_BYTES) {
      this.fileError.set({ kind, message: `${file.name} is larger than ${CATALOGUE_CSV_MAX_TEXT}; split it into smaller files.` });
      return;
    }
    this.fileError.set(null);
    this.store.dispatch(CataloguePageActions.importPreviewRequested({ kind, csv: await file.text() }));
  }

  protected confirmImport(choices: ImportChoiceLine[]): void {
    const preview = this.vm().importPreview;
    if (preview) this.store.dispatch(CataloguePageActions.importConfirmed({ kind: preview.kind, csv: preview.csv, choices }));
  }

  protected showUsage(kind: IngredientKind, request: { entry: CatalogueEntry; purpose: 'view' | 'retire' }): void {
    this.store.dispatch(CataloguePageActions.usageRequested({ kind, id: request.entry.id, name: request.entry.name, purpose: request.purpose }));
  }

  protected dismissUsage(): void {
    this.store.dispatch(CataloguePageActions.usageDismissed());
  }

  protected dismissImport(): void {
    this.store.dispatch(CataloguePageActions.importDismissed());
  }

  protected saveStyle(input: StyleTargetInput): void {
    const editing = this.editingStyle();
    this.editingStyle.set(null);
    this.store.dispatch(editing ? CataloguePageActions.styleChanged({ styleId: editing.id, input }) : CataloguePageActions.styleAdded({ input }));
  }

  protected saveBrewhouse(settings: BrewhouseSettings): void {
    this.store.dispatch(CataloguePageActions.brewhouseSaved({ settings }));
  }
}
