import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDatepicker, MatDatepickerInput, MatDatepickerToggle } from '@angular/material/datepicker';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { DateTime } from 'luxon';

/** A new brew date for a planned batch; the server re-checks the whole schedule and names what collides. */
@Component({
  selector: 'cw-move-batch-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, MatDatepicker, MatDatepickerInput, MatDatepickerToggle, MatButton],
  template: `
    <form class="move" [formGroup]="form" (ngSubmit)="submit()" novalidate [attr.aria-label]="'Move ' + batchName()">
      <mat-form-field appearance="outline" subscriptSizing="dynamic">
        <mat-label>New brew date</mat-label>
        <input matInput [matDatepicker]="picker" formControlName="brewDate" [min]="today()" />
        <mat-datepicker-toggle matIconSuffix [for]="picker" />
        <mat-datepicker #picker />
        <mat-error>Pick a day (yyyy-MM-dd).</mat-error>
      </mat-form-field>
      <button mat-stroked-button type="submit" [disabled]="pending()">Move</button>
    </form>
    @if (error(); as message) {
      <p class="cw-form-error" role="alert">{{ message }}</p>
    }
  `,
  styles: `
    .move { display: flex; flex-wrap: wrap; gap: 8px; align-items: center; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MoveBatchForm {
  readonly batchName = input.required<string>();
  readonly brewDate = input.required<string>();
  readonly today = input.required<DateTime>();
  readonly pending = input(false);
  readonly error = input<string | null>(null);
  readonly moved = output<string>();

  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({ brewDate: this.fb.control<DateTime | null>(null, Validators.required) });

  constructor() {
    effect(() => this.form.setValue({ brewDate: DateTime.fromISO(this.brewDate()) }));
  }

  protected submit(): void {
    if (this.pending() || this.form.invalid) return;
    this.moved.emit(this.form.getRawValue().brewDate!.toISODate()!);
  }
}
