import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { UsagePanel } from '../state/catalogue.feature';

/**
 * Where one catalogue entry is used: each recipe with the versions that contain it. Before a retire
 * it says how many current recipes use the entry and asks for the retire to be confirmed.
 */
@Component({
  selector: 'cw-ingredient-usage-panel',
  imports: [MatButton, RouterLink],
  templateUrl: './ingredient-usage-panel.html',
  styleUrl: './ingredient-usage-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IngredientUsagePanel {
  readonly panel = input.required<UsagePanel>();
  readonly saving = input(false);
  readonly retireConfirmed = output<void>();
  readonly dismissed = output<void>();

  /** Recipes whose current, unarchived version uses the entry, hidden ones included. */
  protected readonly currentCount = computed(() => {
    const usage = this.panel().usage;
    return usage ? usage.uses.filter((use) => use.inCurrentRecipe).length + usage.hiddenCurrentRecipeCount : 0;
  });
}
