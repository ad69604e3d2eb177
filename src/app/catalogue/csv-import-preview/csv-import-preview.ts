import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { CatalogueImportResult } from '@shared/recipes';
import { KIND_LABELS } from '../catalogue-columns';

/** What a CSV file would add, and every line that keeps it from being imported. */
@Component({
  selector: 'cw-csv-import-preview',
  imports: [MatButton],
  templateUrl: './csv-import-preview.html',
  styleUrl: './csv-import-preview.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvImportPreview {
  readonly result = input.required<CatalogueImportResult>();
  readonly importing = input(false);
  readonly confirmed = output<void>();
  readonly dismissed = output<void>();

  protected readonly label = computed(() => KIND_LABELS[this.result().kind].plural.toLowerCase());
  protected readonly columns = computed(() => [...new Set(this.result().rows.flatMap((row) => Object.keys(row)))]);
  protected readonly valid = computed(() => this.result().problems.length === 0 && this.result().rows.length > 0);
}
