import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { GravityReading, INSTRUMENT_LABELS, READING_LIMITS, ReadingChangesRequest, UNIT_LABELS } from '@shared/readings';

const L = READING_LIMITS;

/**
 * Corrects what was noted beside a reading: its temperatures and note. The value, unit, instrument
 * and time stay as read; the server recomputes the corrected gravity and audits the change.
 */
@Component({
  selector: 'cw-reading-edit-dialog',
  imports: [ReactiveFormsModule, MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton, MatFormField, MatLabel, MatHint, MatError, MatSuffix, MatInput],
  template: `
    <h2 mat-dialog-title>Correct the reading</h2>
    <form [formGroup]="form" (ngSubmit)="save()" aria-label="Correct the reading">
      <mat-dialog-content>
        <p>{{ instrument }} {{ reading.rawValue }} {{ unit }}: the value as read stays as read. If it was wrong, delete the reading and log it again.</p>
        <mat-form-field appearance="outline">
          <mat-label>Sample temperature</mat-label>
          <input matInput type="number" inputmode="decimal" formControlName="sampleTemperatureC" [min]="limits.sampleTemperatureC.min" [max]="limits.sampleTemperatureC.max" step="0.1" />
          <span matTextSuffix>°C</span>
          <mat-error>Between {{ limits.sampleTemperatureC.min }} and {{ limits.sampleTemperatureC.max }} °C.</mat-error>
        </mat-form-field>
        @if (reading.instrument === 'hydrometer') {
          <mat-form-field appearance="outline">
            <mat-label>Calibration temperature</mat-label>
            <input matInput type="number" inputmode="decimal" formControlName="calibrationTemperatureC" [min]="limits.calibrationTemperatureC.min" [max]="limits.calibrationTemperatureC.max" step="0.1" />
            <span matTextSuffix>°C</span>
            <mat-hint>Printed on the hydrometer</mat-hint>
            <mat-error>Between {{ limits.calibrationTemperatureC.min }} and {{ limits.calibrationTemperatureC.max }} °C.</mat-error>
          </mat-form-field>
        }
        <mat-form-field appearance="outline">
          <mat-label>Note</mat-label>
          <textarea matInput formControlName="note" rows="2" [maxlength]="limits.noteMaxLength"></textarea>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" [mat-dialog-close]="null">Cancel</button>
        <button mat-flat-button type="submit">Save correction</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: 'mat-form-field { display: block; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingEditDialog {
  protected readonly reading = inject<GravityReading>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<ReadingEditDialog, ReadingChangesRequest | null>>(MatDialogRef);
  protected readonly limits = L;
  protected readonly instrument = INSTRUMENT_LABELS[this.reading.instrument];
  protected readonly unit = UNIT_LABELS[this.reading.rawUnit];
  protected readonly form = inject(NonNullableFormBuilder).group({
    sampleTemperatureC: [this.reading.sampleTemperatureC, [Validators.min(L.sampleTemperatureC.min), Validators.max(L.sampleTemperatureC.max)]],
    calibrationTemperatureC: [this.reading.calibrationTemperatureC, [Validators.min(L.calibrationTemperatureC.min), Validators.max(L.calibrationTemperatureC.max)]],
    note: [this.reading.note, Validators.maxLength(L.noteMaxLength)],
  });

  /** Closes with the fields that changed (nothing sent when none did). */
  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const changes: ReadingChangesRequest = {};
    if (v.sampleTemperatureC !== this.reading.sampleTemperatureC) changes.sampleTemperatureC = v.sampleTemperatureC;
    if (this.reading.instrument === 'hydrometer' && v.calibrationTemperatureC !== this.reading.calibrationTemperatureC) changes.calibrationTemperatureC = v.calibrationTemperatureC;
    if (v.note !== this.reading.note) changes.note = v.note;
    this.ref.close(Object.keys(changes).length ? changes : null);
  }
}
