import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatSort, MatSortHeader, Sort } from '@angular/material/sort';
import { sortRows, TableSort } from '@app/ui/table-sort/table-sort';
import { Fermentable, Hop, IngredientKind, OtherAddition, Yeast } from '@shared/recipes';
import { ebcFromLovibond } from '@shared/science';
import { CatalogueEntry } from '../catalogue-entry';
import { KIND_LABELS } from '../catalogue-columns';

/** A retire or restore asked for on one entry. */
export interface RetiredChange {
  id: number;
  retired: boolean;
}

/** The entries of one kind with their properties and where they are used; brewers and admins edit and retire them here. */
@Component({
  selector: 'cw-catalogue-table',
  imports: [MatButton, MatSort, MatSortHeader],
  templateUrl: './catalogue-table.html',
  styleUrl: '../../recipes/recipe-table/recipe-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogueTable {
  readonly kind = input.required<IngredientKind>();
  readonly entries = input.required<readonly CatalogueEntry[]>();
  readonly canEdit = input(false);
  readonly saving = input(false);
  readonly editRequested = output<CatalogueEntry>();
  readonly retiredChanged = output<RetiredChange>();
  /** Asks where an entry is used; `retire` asks before retiring it. */
  readonly usageRequested = output<{ entry: CatalogueEntry; purpose: 'view' | 'retire' }>();

  protected readonly label = computed(() => KIND_LABELS[this.kind()]);
  protected readonly columns = computed(() => COLUMNS[this.kind()]);
  /** Sorted by name until a header is clicked; a third click on a header goes back to the name. */
  protected readonly sort = signal<TableSort>({ column: 'name', direction: 'asc' });
  protected readonly rows = computed(() => {
    const columns = this.columns();
    const valueOf = (entry: CatalogueEntry, key: string) => (key === 'name' ? entry.name : (columns.find((c) => c.heading === key)?.value(entry) ?? null));
    return sortRows(this.entries(), this.sort(), valueOf).map((entry) => ({ entry, cells: columns.map((column) => column.text(entry)) }));
  });

  protected changeSort(event: Sort): void {
    this.sort.set(event.direction ? { column: event.active, direction: event.direction } : { column: 'name', direction: 'asc' });
  }
}

interface Column {
  heading: string;
  text(entry: CatalogueEntry): string;
  /** What the column sorts by: numbers by size, text as read. */
  value(entry: CatalogueEntry): string | number | null;
}

const COLUMNS: Record<IngredientKind, Column[]> = {
  fermentables: [
    { heading: 'Kind', text: (e) => (e as Fermentable).kind, value: (e) => (e as Fermentable).kind },
    { heading: 'Extract', text: (e) => `${(e as Fermentable).extractPercent} %`, value: (e) => (e as Fermentable).extractPercent },
    { heading: 'Colour', text: (e) => `${(e as Fermentable).colourLovibond} °L (${Math.round(ebcFromLovibond((e as Fermentable).colourLovibond))} EBC)`, value: (e) => (e as Fermentable).colourLovibond },
    { heading: 'Usual max share', text: (e) => ((e as Fermentable).maxSharePercent === null ? 'no limit' : `${(e as Fermentable).maxSharePercent} %`), value: (e) => (e as Fermentable).maxSharePercent },
  ],
  hops: [
    { heading: 'Alpha acids', text: (e) => `${(e as Hop).alphaAcidPercent} %`, value: (e) => (e as Hop).alphaAcidPercent },
    { heading: 'Form', text: (e) => (e as Hop).form, value: (e) => (e as Hop).form },
  ],
  yeasts: [
    { heading: 'Attenuation', text: (e) => `${(e as Yeast).attenuationMinPercent}–${(e as Yeast).attenuationMaxPercent} %`, value: (e) => (e as Yeast).attenuationMinPercent },
    { heading: 'Temperature', text: (e) => `${(e as Yeast).temperatureMinC}–${(e as Yeast).temperatureMaxC} °C`, value: (e) => (e as Yeast).temperatureMinC },
    { heading: 'Flocculation', text: (e) => (e as Yeast).flocculation, value: (e) => (e as Yeast).flocculation },
  ],
  others: [{ heading: 'Kind', text: (e) => (e as OtherAddition).kind, value: (e) => (e as OtherAddition).kind }],
};
