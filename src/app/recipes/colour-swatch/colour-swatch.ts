import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { swatchColour } from './swatch-colour';

/** A small square in the beer's approximate shade. */
@Component({
  selector: 'cw-colour-swatch',
  template: '',
  styles: ':host { display: inline-block; width: 1.5em; height: 1.5em; border-radius: 4px; border: 1px solid rgb(0 0 0 / 0.3); vertical-align: middle; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[style.background-color]': 'colour()', 'aria-hidden': 'true' },
})
export class ColourSwatch {
  readonly srm = input.required<number>();

  protected readonly colour = computed(() => swatchColour(this.srm()));
}
