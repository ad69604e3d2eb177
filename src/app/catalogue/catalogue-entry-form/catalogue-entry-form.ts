import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, untracked } from '@angular/core';
import { FormControl, FormGroup, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { IngredientKind } from '@shared/recipes';
import { readyToSubmit } from '@app/ui/ready-to-submit';
import { CatalogueEntry, CatalogueEntryInput } from '../catalogue-entry';
import { EbcPipe } from '../ebc-pipe';
import { KIND_LABELS } from '../catalogue-columns';
import { ENTRY_LAYOUTS } from './catalogue-entry-fields';
import { entryFormGroups, entryInputOf } from './catalogue-entry-form-groups';

/** Adds or changes one catalogue entry; the fields follow the kind. */
@Component({
  selector: 'cw-catalogue-entry-form',
  imports: [ReactiveFormsModule, EbcPipe, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatSelect, MatOption, MatButton],
  templateUrl: './catalogue-entry-form.html',
  styleUrl: './catalogue-entry-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogueEntryForm {
  readonly kind = input.required<IngredientKind>();
  /** The entry being changed, or null to add a new one. */
  readonly entry = input<CatalogueEntry | null>(null);
  readonly saving = input(false);
  /** Goes up by one per saved entry; the form then clears. */
  readonly savedCount = input(0);
  readonly submitted = output<CatalogueEntryInput>();
  readonly cancelled = output<void>();

  protected readonly groups = entryFormGroups(inject(NonNullableFormBuilder));
  protected readonly group = computed((): FormGroup => this.groups[this.kind()]);
  protected readonly layout = computed(() => ENTRY_LAYOUTS[this.kind()]);
  protected readonly title = computed(() => `${this.entry() ? 'Change' : 'Add'} ${this.entry()?.name ?? 'a ' + KIND_LABELS[this.kind()].singular}`);

  constructor() {
    effect(() => {
      this.savedCount();
      const entry = this.entry();
      const kind = this.kind();
      untracked(() => {
        const group = this.groups[kind];
        group.reset();
        if (entry) group.patchValue(entry as never);
      });
    });
  }

  /** The control of the shown kind's group under `name`. */
  protected control(name: string): FormControl {
    return this.group().get(name) as FormControl;
  }

  protected submit(): void {
    if (!readyToSubmit(this.group())) return;
    this.submitted.emit(entryInputOf(this.kind(), this.groups));
  }
}
