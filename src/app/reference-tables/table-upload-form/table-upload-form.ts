import { KeyValuePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { DENSITY_TABLE_COLUMNS, DENSITY_TABLE_LIMITS as L, DENSITY_TABLE_UPLOAD } from '@shared/reference-tables';
import { TableUpload } from '../reference-tables-client';

/** Uploads a density table CSV; states the limits the server enforces and lists each line it refused. */
@Component({
  selector: 'cw-table-upload-form',
  imports: [ReactiveFormsModule, KeyValuePipe, MatFormField, MatLabel, MatError, MatHint, MatSuffix, MatInput, MatButton, MatIcon],
  templateUrl: './table-upload-form.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TableUploadForm {
  private readonly fb = inject(NonNullableFormBuilder);
  readonly uploading = input(false);
  readonly error = input<string | null>(null);
  readonly problems = input<Record<string, string> | null>(null);
  readonly submitted = output<TableUpload>();

  protected readonly limits = L;
  protected readonly upload = DENSITY_TABLE_UPLOAD;
  protected readonly columns = DENSITY_TABLE_COLUMNS.join(',');
  protected readonly file = signal<File | null>(null);
  protected readonly form = this.fb.group({
    name: this.fb.control('', [Validators.required, Validators.maxLength(L.nameMax)]),
    resolution: this.fb.control<number>(0.01, [Validators.required, Validators.min(L.resolution.min), Validators.max(L.resolution.max)]),
  });

  protected chooseFile(input: HTMLInputElement): void {
    this.file.set(input.files?.[0] ?? null);
  }

  protected async submit(): Promise<void> {
    const file = this.file();
    if (this.form.invalid || !file) {
      this.form.markAllAsTouched();
      return;
    }
    const { name, resolution } = this.form.getRawValue();
    this.submitted.emit({ name: name.trim(), resolution, fileName: file.name, csv: await file.text() });
  }
}
