import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, effect, input, output, signal, untracked } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { DENSITY_TABLE_LIMITS as L, ReferenceTableRow } from '@shared/reference-tables';
import type { AuditedRow } from '@shared/science';

/** A correction of one row, as the form emits it. */
export interface RowCorrection { rowId: number; density: number; note: string }

/** The table's rows with their audit: suspect rows marked with their bump and a suggested density; brewers correct a row. */
@Component({
  selector: 'cw-audited-rows',
  imports: [DecimalPipe, MatButton, MatFormField, MatLabel, MatSuffix, MatInput],
  templateUrl: './audited-rows.html',
  styleUrl: './audited-rows.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuditedRows {
  readonly rows = input.required<{ row: ReferenceTableRow; audit: AuditedRow }[]>();
  readonly canCorrect = input(false);
  readonly correcting = input(false);
  readonly correctedCount = input(0);
  readonly corrected = output<RowCorrection>();

  protected readonly limits = L;
  protected readonly editing = signal<number | null>(null);
  protected readonly density = signal<number | null>(null);
  protected readonly note = signal('');

  constructor() {
    effect(() => {
      this.correctedCount();
      untracked(() => this.editing.set(null));
    });
  }

  protected startCorrection(row: ReferenceTableRow, audit: AuditedRow): void {
    this.editing.set(row.id);
    this.density.set(Math.round((audit.flagged ? audit.suggestedDensity : row.correctedDensity ?? row.uploadedDensity) * 1e4) / 1e4);
    this.note.set('');
  }

  protected saveCorrection(rowId: number): void {
    const density = this.density();
    if (density === null || !(density >= L.density.min && density <= L.density.max)) return;
    this.corrected.emit({ rowId, density, note: this.note().trim() });
  }

  protected readNumber(target: EventTarget | null): number | null {
    const text = (target as HTMLInputElement).value;
    return text.trim() === '' ? null : Number(text);
  }

  protected readText(target: EventTarget | null): string {
    return (target as HTMLInputElement).value;
  }
}
