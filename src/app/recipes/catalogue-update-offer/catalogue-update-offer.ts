import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { SnapshotChange } from '@shared/recipes';
import { changeLabel } from './change-label';

/**
 * Offers to bring the open version up to today's catalogue and brewhouse. Nothing changes until the
 * owner asks; the update is saved as a new version and the earlier ones keep their values.
 */
@Component({
  selector: 'cw-catalogue-update-offer',
  imports: [MatButton],
  templateUrl: './catalogue-update-offer.html',
  styleUrl: './catalogue-update-offer.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CatalogueUpdateOffer {
  readonly changes = input.required<readonly SnapshotChange[]>();
  readonly version = input.required<number>();
  readonly blockedByEdits = input(false);
  readonly saving = input(false);
  readonly updateRequested = output<void>();

  protected readonly lines = computed(() => this.changes().map(changeLabel));
}
