import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { DateTime } from 'luxon';

/** A fermenter the batch may move to. */
export interface FermenterChoice {
  id: number;
  label: string;
}

/** Where a planned batch is to go. */
export interface BatchMove {
  brewDate: string;
  kitItemId: number;
}

/** A new brew date (and fermenter) for a planned batch; the server re-checks the whole schedule and names what collides. */
@Component({
  selector: 'cw-move-batch-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatSelect, MatOption, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatButton],
  template: `
    <form class="move" [formGroup]="form" (ngSubmit)="submit()" novalidate [attr.aria-label]="'Move ' + batchName()">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>New brew date</mat-label>
        <input matInput [matDatepicker]="picker" formControlName="brewDate" [min]="today()" />
        <mat-datepicker-toggle matIconSuffix [for]="picker" />
        <mat-datepicker #picker />
        <mat-error>Pick a day (yyyy-MM-dd).</mat-error>
      </mat-form-field>
      <mat-form-field appearance="outline" subscriptSizing="dynamic" class="fermenter">
        <mat-label>Fermenter</mat-label>
        <mat-select formControlName="kitItemId">
          @for (f of fermenters(); track f.id) {
            <mat-option [value]="f.id">{{ f.label }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
      <button mat-stroked-button type="submit" [disabled]="pending()">Move</button>
    </form>
    @if (error(); as message) {
      <p class="cw-form-error" role="alert">{{ message }}</p>
    }
  `,
  styles: `
    .move { display: flex; flex-wrap: wrap; gap: 8px; align-items: center; }
    .fermenter { width: 9rem; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MoveBatchForm {
  readonly batchName = input.required<string>();
  readonly brewDate = input.required<string>();
  readonly kitItemId = input.required<number>();
  readonly fermenters = input.required<FermenterChoice[]>();
  readonly today = input.required<DateTime>();
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly moved = output<BatchMove>();

  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    brewDate: this.fb.control<DateTime | null>(null, Validators.required),
    kitItemId: this.fb.control<number>(0, Validators.required),
  });

  constructor() {
    effect(() => this.form.setValue({ brewDate: DateTime.fromISO(this.brewDate()), kitItemId: this.kitItemId() }));
  }

  protected submit(): void {
    if (this.pending() || this.form.invalid) return;
    const { brewDate, kitItemId } = this.form.getRawValue();
    this.moved.emit({ brewDate: brewDate!.toISODate()!, kitItemId });
  }
}
