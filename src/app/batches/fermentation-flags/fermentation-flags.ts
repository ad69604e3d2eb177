import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { BatchProgress } from '@shared/batches';

/** "Looks finished" or "Looks stuck", from the log's flags; nothing while neither holds. */
@Component({
  selector: 'cw-fermentation-flags',
  template: `
    @if (progress().stuck) {
      <span class="flag stuck" title="Gravity has held for two days well above what the yeast usually reaches">Looks stuck</span>
    } @else if (progress().finished) {
      <span class="flag finished" title="Gravity has held within the instrument's resolution for at least 48 h">Looks finished</span>
    } @else if (progress().readingCount > 0) {
      <span class="flag">Still moving</span>
    } @else {
      <span class="flag none">No readings</span>
    }
  `,
  styles: `
    .flag { display: inline-block; padding: 0.1rem 0.5rem; border-radius: 1rem; font-size: 0.85rem; background: #ece7df; color: #1f2421; }
    .finished { background: #d5e6dd; color: #1d3d34; }
    .stuck { background: #f5dccd; color: #6b3316; font-weight: 600; }
    .none { background: transparent; padding-left: 0; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FermentationFlags {
  readonly progress = input.required<BatchProgress>();
}
