import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
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
  imports: [MatButton],
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
  protected readonly rows = computed(() => {
    const columns = this.columns();
    return this.entries().map((entry) => ({ entry, cells: columns.map((column) => column.text(entry)) }));
  });
}

interface Column {
  heading: string;
  text(entry: CatalogueEntry): string;
}

const COLUMNS: Record<IngredientKind, Column[]> = {
  fermentables: [
    { heading: 'Kind', text: (e) => (e as Fermentable).kind },
    { heading: 'Extract', text: (e) => `${(e as Fermentable).extractPercent} %` },
    { heading: 'Colour', text: (e) => `${(e as Fermentable).colourLovibond} °L (${Math.round(ebcFromLovibond((e as Fermentable).colourLovibond))} EBC)` },
    { heading: 'Usual max share', text: (e) => ((e as Fermentable).maxSharePercent === null ? 'no limit' : `${(e as Fermentable).maxSharePercent} %`) },
  ],
  hops: [
    { heading: 'Alpha acids', text: (e) => `${(e as Hop).alphaAcidPercent} %` },
    { heading: 'Form', text: (e) => (e as Hop).form },
  ],
  yeasts: [
    { heading: 'Attenuation', text: (e) => `${(e as Yeast).attenuationMinPercent}–${(e as Yeast).attenuationMaxPercent} %` },
    { heading: 'Temperature', text: (e) => `${(e as Yeast).temperatureMinC}–${(e as Yeast).temperatureMaxC} °C` },
    { heading: 'Flocculation', text: (e) => (e as Yeast).flocculation },
  ],
  others: [{ heading: 'Kind', text: (e) => (e as OtherAddition).kind }],
};
