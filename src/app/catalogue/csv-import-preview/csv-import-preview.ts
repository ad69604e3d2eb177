import { ChangeDetectionStrategy, Component, computed, effect, input, output, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { CatalogueImportResult, ImportChoice } from '@shared/recipes';
import { KIND_LABELS } from '../catalogue-columns';

/** A brewer's choice for one row whose name the catalogue already has. */
export interface ImportChoiceLine {
  line: number;
  choice: ImportChoice;
}

/**
 * What a CSV file would add, every line that keeps it from being imported, and a choice (skip or
 * update) for each row whose name the catalogue already has. Skipping is chosen until changed.
 */
@Component({
  selector: 'cw-csv-import-preview',
  imports: [MatButton, MatRadioGroup, MatRadioButton],
  templateUrl: './csv-import-preview.html',
  styleUrl: './csv-import-preview.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvImportPreview {
  readonly result = input.required<CatalogueImportResult>();
  readonly importing = input(false);
  readonly confirmed = output<ImportChoiceLine[]>();
  readonly dismissed = output<void>();

  protected readonly choices = signal<ReadonlyMap<number, ImportChoice>>(new Map());
  protected readonly label = computed(() => KIND_LABELS[this.result().kind].plural.toLowerCase());
  protected readonly columns = computed(() => [...new Set(this.result().rows.flatMap((row) => Object.keys(row)))]);
  protected readonly valid = computed(() => this.result().problems.length === 0 && this.result().rows.length > 0);
  protected readonly counts = computed(() => {
    const existing = this.result().existing;
    const updates = existing.filter((each) => this.choices().get(each.line) === 'update').length;
    return { added: this.result().rows.length - existing.length, updated: updates, skipped: existing.length - updates };
  });

  constructor() {
    // A new file starts with every existing name skipped.
    effect(() => this.choices.set(new Map(this.result().existing.map((each) => [each.line, 'skip' as const]))));
  }

  protected choose(line: number, choice: ImportChoice): void {
    this.choices.update((choices) => new Map(choices).set(line, choice));
  }

  protected confirm(): void {
    this.confirmed.emit([...this.choices()].map(([line, choice]) => ({ line, choice })));
  }
}
