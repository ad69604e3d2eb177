import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { BatchSummary } from '@shared/batches';

/** The co-op's batches, each opening its strength check and its fermentation chart. */
@Component({
  selector: 'cw-batch-picker',
  imports: [RouterLink],
  template: `
    @if (batches().length === 0) {
      <p>No batches yet.</p>
    } @else {
      <ul class="batches">
        @for (b of batches(); track b.id) {
          <li>
            <a [routerLink]="['/strength-check', 'batches', b.id]">{{ b.name }}</a> ({{ b.status }}, {{ b.brewerName }}) ·
            <a [routerLink]="['/fermentation', b.id]">chart and forecast<span class="cw-visually-hidden"> of {{ b.name }}</span></a>
          </li>
        }
      </ul>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BatchPicker {
  readonly batches = input.required<BatchSummary[]>();
}
