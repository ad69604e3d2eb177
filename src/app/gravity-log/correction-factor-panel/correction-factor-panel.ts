import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatOption, MatSelect } from '@angular/material/select';
import { CorrectionFactorRequest } from '@shared/batches';
import { GravityReading } from '@shared/readings';
import { ZonedDateTimePipe } from '@app/ui/zoned-date-time-pipe';

/** The batch's refractometer wort correction factor, derived from a refractometer and a hydrometer reading of one sample. */
@Component({
  selector: 'cw-correction-factor-panel',
  imports: [DecimalPipe, FormsModule, MatButton, MatFormField, MatLabel, MatSelect, MatOption, ZonedDateTimePipe],
  template: `
    <p>Wort correction factor: <strong>{{ factor() | number: '1.3-3' }}</strong>. Refractometer readings are divided by it; after pitching they are also corrected for alcohol.</p>
    @if (refractometer().length > 0 && hydrometer().length > 0) {
      <div class="pair">
        <mat-form-field appearance="outline">
          <mat-label>Refractometer reading</mat-label>
          <mat-select [ngModel]="refractometerId()" (ngModelChange)="refractometerId.set($event)">
            @for (r of refractometer(); track r.id) {
              <mat-option [value]="r.id">{{ r.measuredAt | cwZonedDateTime: coopTimeZone() : 'numeric' }} · {{ r.rawValue }} °Bx</mat-option>
            }
          </mat-select>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Hydrometer reading of the same wort</mat-label>
          <mat-select [ngModel]="hydrometerId()" (ngModelChange)="hydrometerId.set($event)">
            @for (r of hydrometer(); track r.id) {
              <mat-option [value]="r.id">{{ r.measuredAt | cwZonedDateTime: coopTimeZone() : 'numeric' }} · SG {{ r.correctedSg | number: '1.4-4' }}</mat-option>
            }
          </mat-select>
        </mat-form-field>
        <button mat-stroked-button type="button" [disabled]="refractometerId() === null || hydrometerId() === null" (click)="derive()">Derive the factor</button>
      </div>
    } @else {
      <p class="hint">Log a refractometer and a hydrometer reading of the same unfermented wort (on this page) to derive the factor from them.</p>
    }
  `,
  styles: `
    .pair { display: flex; flex-wrap: wrap; gap: 0 12px; align-items: baseline; }
    .hint { font-size: 0.9rem; color: #4a524d; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CorrectionFactorPanel {
  readonly factor = input.required<number>();
  readonly readings = input.required<readonly GravityReading[]>();
  readonly coopTimeZone = input.required<string>();
  readonly submitted = output<CorrectionFactorRequest>();

  protected readonly refractometer = computed(() => this.readings().filter((r) => r.instrument === 'refractometer'));
  protected readonly hydrometer = computed(() => this.readings().filter((r) => r.instrument === 'hydrometer' || r.instrument === 'density-meter'));
  protected readonly refractometerId = signal<number | null>(null);
  protected readonly hydrometerId = signal<number | null>(null);

  protected derive(): void {
    const refractometerReadingId = this.refractometerId();
    const hydrometerReadingId = this.hydrometerId();
    if (refractometerReadingId !== null && hydrometerReadingId !== null) this.submitted.emit({ refractometerReadingId, hydrometerReadingId });
  }
}
