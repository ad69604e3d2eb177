import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { MatOption, MatSelect } from '@angular/material/select';
import { GRAVITY_UNITS, ImportMode, INSTRUMENT_LABELS, INSTRUMENTS, READING_LIMITS, ReadingColumnMapping, ReadingImportResult, UNIT_LABELS } from '@shared/readings';
import { ImportState } from '../state/readings.feature';
import { guessMapping, previewCsv } from './csv-preview';

/** What the upload sends. */
export interface ReadingUploadRequest {
  file: File;
  mode: ImportMode;
  dryRun: boolean;
  columns: ReadingColumnMapping;
}

/** CSV upload: choose the columns with a preview, check the file, then import all or only the good rows. */
@Component({
  selector: 'cw-reading-upload',
  imports: [FormsModule, MatButton, MatFormField, MatLabel, MatSelect, MatOption, MatRadioGroup, MatRadioButton, MatProgressBar],
  templateUrl: './reading-upload.html',
  styleUrl: './reading-upload.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReadingUpload {
  readonly state = input.required<ImportState>();
  readonly submitted = output<ReadingUploadRequest>();

  protected readonly maxMegabytes = READING_LIMITS.uploadMaxBytes / 1024 / 1024;
  protected readonly instruments = INSTRUMENTS;
  protected readonly instrumentLabels = INSTRUMENT_LABELS;
  protected readonly units = GRAVITY_UNITS;
  protected readonly unitLabels = UNIT_LABELS;
  protected readonly file = signal<File | null>(null);
  protected readonly header = signal<string[]>([]);
  protected readonly rows = signal<string[][]>([]);
  protected readonly mapping = signal<ReadingColumnMapping | null>(null);
  protected readonly mode = signal<ImportMode>('good-rows-only');

  protected async chooseFile(input: HTMLInputElement): Promise<void> {
    const file = input.files?.[0] ?? null;
    input.value = '';
    this.file.set(file);
    if (!file) return;
    const preview = previewCsv(await file.slice(0, 64 * 1024).text());
    this.header.set(preview.header);
    this.rows.set(preview.rows);
    this.mapping.set(guessMapping(preview.header));
  }

  protected setColumn(key: keyof ReadingColumnMapping, value: string | null): void {
    this.mapping.update((m) => (m ? { ...m, [key]: value } : m));
  }

  protected send(dryRun: boolean): void {
    const file = this.file();
    const columns = this.mapping();
    if (file && columns) this.submitted.emit({ file, mode: this.mode(), dryRun, columns });
  }

  protected summary(result: ReadingImportResult): string {
    if (result.dryRun) return `Checked ${result.rowsTotal} rows: ${result.notImported} good, ${result.problems.length} bad, ${result.duplicates.length} already in the log. Nothing stored yet.`;
    if (result.imported === 0 && result.problems.length && result.mode === 'all-or-nothing') return `Nothing imported: ${result.problems.length} bad lines (all or nothing).`;
    return `Imported ${result.imported} of ${result.rowsTotal} rows; ${result.duplicates.length} already in the log, ${result.problems.length} bad lines skipped.`;
  }
}
