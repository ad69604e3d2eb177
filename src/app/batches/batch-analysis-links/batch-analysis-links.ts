import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatAnchor } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';

/** Links from a batch to its fermentation chart with the forecast and to its strength check. */
@Component({
  selector: 'cw-batch-analysis-links',
  imports: [RouterLink, MatAnchor, MatIcon],
  template: `
    <a mat-stroked-button [routerLink]="['/fermentation', batchId()]">
      <mat-icon aria-hidden="true">show_chart</mat-icon>
      Chart and forecast
    </a>
    <a mat-stroked-button [routerLink]="['/strength-check/batches', batchId()]">
      <mat-icon aria-hidden="true">percent</mat-icon>
      Strength check
    </a>
  `,
  host: { class: 'batch-links' },
  styles: `
    :host {
      display: flex;
      flex-wrap: wrap;
      gap: 8px;
      margin: 8px 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchAnalysisLinks {
  readonly batchId = input.required<number>();
}
